import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeCircle, runGridSearch, type SectionDocument } from "@/lib/stability";
import { keptWarnings, searchRecord, warningMethod } from "@/lib/runs/record/search-record";

const fixture = (name: string) =>
  JSON.parse(
    readFileSync(path.join(__dirname, "..", "..", "..", "fixtures", "sections", name), "utf8"),
  ) as SectionDocument;

// A staged-drawdown embankment whose Bishop and ordinary-method critical circles differ, and
// where N′ comes out negative on some slices of each (the case of issue 13 item 4).
const doc = fixture("drawdown-staged-embankment.json");

describe("searchRecord", () => {
  const record = searchRecord(doc);
  if (!record.ok) throw new Error("the fixture must search");
  const { result, critical } = record;

  it("runs the same search as the engine and reports each method's own critical circle", () => {
    const plain = runGridSearch(doc);
    if (!plain.ok) throw new Error("search failed");
    expect(result.results).toEqual(plain.results);
    expect(result.fsMap).toEqual(plain.fsMap);
    expect(result.circles).toEqual(plain.circles);
    for (const m of result.methods) expect(critical[m]?.circle).toEqual(result.results[m]?.circle);
    // Bishop's FS of the Bishop circle, re-analysed alone, is the search's FS (deterministic engine).
    expect(critical.bishop?.fs.bishop).toBe(result.results.bishop?.fs);
  });

  it("keeps the search's own warnings and one negative-N′ count per method, from that method's circle", () => {
    const plain = runGridSearch(doc);
    if (!plain.ok) throw new Error("search failed");
    for (const w of plain.warnings) expect(result.warnings).toContainEqual(w);
    const negative = result.warnings.filter((w) => w.code === "negative-normal");
    const perMethod = negative.map(warningMethod);
    expect(new Set(perMethod).size).toBe(perMethod.length);
    // The ordinary method's count is the one of its own critical circle, not of Bishop's.
    const own = analyzeCircle(doc, result.results.fellenius!.circle);
    if (!own.ok) throw new Error("circle failed");
    const ordinaryOwn = own.warnings.find((w) => w.code === "negative-normal" && warningMethod(w) === "fellenius");
    expect(ordinaryOwn).toBeDefined();
    expect(negative.filter((w) => warningMethod(w) === "fellenius")).toEqual([ordinaryOwn]);
    // The two circles differ here, so Bishop's circle's ordinary count would be a second, different count.
    expect(result.results.bishop!.circle).not.toEqual(result.results.fellenius!.circle);
  });

  it("is idempotent: gathering an already gathered list adds nothing", () => {
    expect(keptWarnings(result, critical)).toEqual(result.warnings);
  });
});

describe("warningMethod", () => {
  it("reads the method a circle report's warning speaks of, null for the circle as a whole", () => {
    expect(warningMethod({ code: "negative-normal", message: "Ordinary method: N' came out negative" })).toBe(
      "fellenius",
    );
    expect(warningMethod({ code: "negative-normal", message: "Bishop's simplified method: N'…" })).toBe("bishop");
    expect(warningMethod({ code: "several-slip-masses", message: "The circle cuts 2 separate pieces" })).toBeNull();
  });
});
