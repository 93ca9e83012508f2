import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import type { SectionDocument } from "@/lib/stability";
import { searchRecord } from "@/lib/runs/record/search-record";
import { comparePreview, differenceLine, readPreviewCheck, sameNumber } from "@/lib/runs/record/compare-preview";
import { searchResultSchema } from "@/lib/runs/record/result-schema";

const doc = JSON.parse(
  readFileSync(
    path.join(__dirname, "..", "..", "..", "fixtures", "sections", "three-material-embankment.json"),
    "utf8",
  ),
) as SectionDocument;
const record = searchRecord(doc);
if (!record.ok) throw new Error("the fixture must search");
const server = record.result;
// What a browser sends: the same search through JSON, checked by the route's schema.
const preview = () => searchResultSchema.parse(JSON.parse(JSON.stringify(server)));

describe("comparePreview (issue 12 item 1: differences beyond 1e-6 are reported)", () => {
  it("finds nothing when the browser ran the same search", () => {
    expect(comparePreview(server, preview())).toEqual({
      status: "matched",
      source: "browser",
      differences: [],
      more: 0,
    });
  });

  it("says absent when no preview was sent", () => {
    expect(comparePreview(server, undefined).status).toBe("absent");
  });

  it("reports a forged critical circle with its honest FS, and a forged FS", () => {
    const forged = preview();
    forged.results.bishop = { ...forged.lowest.bishop!.at(-1)!, fs: forged.lowest.bishop!.at(-1)!.fs + 0.9 };
    const check = comparePreview(server, forged);
    expect(check.status).toBe("differed");
    expect(check.differences.map((d) => d.field)).toEqual(expect.arrayContaining(["results.bishop.fs"]));
    const fsLine = check.differences.find((d) => d.field === "results.bishop.fs")!;
    expect(Number(fsLine.server)).toBe(server.results.bishop!.fs);
  });

  it("reports a doctored map, counts and dropped warnings", () => {
    const doctored = preview();
    doctored.fsMap.bishop!.values[3] = 9.99;
    doctored.circles.tried += 1;
    doctored.warnings = [];
    const fields = comparePreview(server, doctored).differences.map((d) => d.field);
    expect(fields).toEqual(expect.arrayContaining(["fsMap.bishop.values", "circles.tried"]));
    if (server.warnings.length > 0) expect(fields).toContain("warnings");
  });

  it("tolerates float noise of 1e-7 relative, not 1e-5", () => {
    expect(sameNumber(1.5, 1.5 * (1 + 1e-7))).toBe(true);
    expect(sameNumber(1.5, 1.5 * (1 + 1e-5))).toBe(false);
    expect(sameNumber(null, null)).toBe(true);
    expect(sameNumber(null, 1)).toBe(false);
  });

  it("lists at most 20 differences and counts the rest; the stored check reads back", () => {
    const noisy = preview();
    noisy.lowest.bishop = noisy.lowest.bishop!.map((c) => ({ ...c, fs: c.fs + 1 }));
    noisy.lowest.fellenius = noisy.lowest.fellenius!.map((c) => ({ ...c, fs: c.fs + 1 }));
    const check = comparePreview(server, noisy);
    expect(check.differences.length).toBeLessThanOrEqual(20);
    expect(check.differences.length + check.more).toBeGreaterThanOrEqual(
      server.lowest.bishop!.length + server.lowest.fellenius!.length,
    );
    expect(readPreviewCheck({ previewCheck: JSON.parse(JSON.stringify(check)) })).toEqual(check);
    expect(readPreviewCheck({})).toBeNull();
  });
});

describe("differenceLine", () => {
  it("words a difference for the run page: FS to 4 decimals, a close call with the digits that differ", () => {
    expect(differenceLine({ field: "results.bishop.fs", sent: "2.26", server: "1.3415688173025713" })).toBe(
      "Bishop's FS: preview 2.2600, server 1.3416",
    );
    expect(differenceLine({ field: "results.bishop.fs", sent: "1.341570", server: "1.341569" })).toBe(
      "Bishop's FS: preview 1.341570000, server 1.341569000",
    );
    expect(differenceLine({ field: "warnings", sent: "none", server: "m-alpha-low: mα falls to 0.150" })).toBe(
      "A warning the server's search raises was missing from the preview: mα falls to 0.150",
    );
  });
});
