import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { CAUTION_TEXT } from "@/components/ui/caution";
import { runFs, sliceCsvFileName, sliceTableToCsv } from "@/lib/runs/view/slice-csv";
import { columnHeader, sliceColumns } from "@/lib/runs/view/slice-columns";
import { SLICES } from "./fixtures";

describe("sliceTableToCsv", () => {
  const csv = sliceTableToCsv(SLICES, {
    method: "bishop",
    title: "Downstream, steady, run 3",
    section: "Demo dam v2",
    fs: { bishop: 1.4123, fellenius: 1.3291 },
    requiredFs: 1.5,
    circle: { xc: 31, yc: 37.5, r: 26.1 },
    ordinaryForm: "classical",
  });
  const rows = Papa.parse<string[]>(csv.trimEnd(), { newline: "\r\n", delimiter: "," }).data;

  it("opens with comment lines carrying the caution and the run's details", () => {
    const comments = rows.filter((r) => r[0].startsWith("#")).map((r) => r.join(","));
    expect(comments[0]).toBe(`# Caution: ${CAUTION_TEXT}`);
    expect(comments.some((c) => c.includes("Run: Downstream, steady, run 3"))).toBe(true);
    expect(comments.some((c) => c.includes("Bishop 1.412; ordinary 1.329 (classical form)"))).toBe(true);
    expect(comments.some((c) => c.includes("Required FS: 1.50"))).toBe(true);
    // Each comment line is a single field, so a comma in a title cannot start a new cell.
    for (const r of rows.filter((x) => x[0].startsWith("#"))) expect(r.length).toBe(1);
  });

  it("has the table's headers with units, one line per slice, CRLF line ends", () => {
    const body = rows.filter((r) => !r[0].startsWith("#"));
    expect(body[0]).toEqual(sliceColumns("bishop").map(columnHeader));
    expect(body[0]).toContain("Weight W (kN/m)");
    expect(body).toHaveLength(1 + SLICES.length);
    expect(csv.split("\r\n").length - 1).toBe(rows.length);
    expect(csv).not.toMatch(/[^\r]\n/);
  });

  it("writes numbers as formatted (negatives unescaped), empty cells for no value, and defuses formula text", () => {
    const body = rows.filter((r) => !r[0].startsWith("#")).slice(1);
    const cols = sliceColumns("bishop").map((c) => c.key);
    const at = (r: number, k: string) => body[r][cols.indexOf(k as never)];
    expect(at(0, "index")).toBe("1");
    expect(at(0, "xLeft")).toBe("10.00");
    expect(at(2, "alpha")).toBe("-12.4");
    expect(at(2, "driving")).toBe("-7.5");
    expect(at(1, "mAlpha")).toBe("");
    expect(at(2, "material")).toBe("'=cmd|' /C calc'!A0");
  });

  it("fills N′ from the ordinary method when asked", () => {
    const o = Papa.parse<string[]>(sliceTableToCsv(SLICES, { method: "fellenius" }).trimEnd(), {
      newline: "\r\n",
      delimiter: ",",
    }).data.filter((r) => !r[0].startsWith("#"));
    expect(o[0]).toContain("N′ (ordinary) (kN/m)");
    expect(o[1][o[0].indexOf("N′ (ordinary) (kN/m)")]).toBe("91.4");
  });

  it("names the file with safe characters only", () => {
    expect(sliceCsvFileName("Run 3: =cmd / downstream!", "bishop")).toBe("run-3-cmd-downstream-slices-bishop.csv");
    expect(sliceCsvFileName(undefined, "fellenius")).toBe("run-slices-ordinary.csv");
  });
});

describe("the FS line of the slice CSV header", () => {
  const fsLineOf = (csv: string) => csv.split("\r\n").find((l) => l.startsWith("# FS:"));

  it("states both methods' FS of a kept run, whichever method fills the table", () => {
    // The defect: a run with ordinary 1.046 wrote "ordinary none" in the Bishop table's CSV.
    const fs = runFs(["bishop", "fellenius"], { fsBishop: 1.1234, fsFellenius: 1.046 });
    const csv = sliceTableToCsv(SLICES, { method: "bishop", fs, ordinaryForm: "classical" });
    expect(fsLineOf(csv)).toBe("# FS: Bishop 1.123; ordinary 1.046 (classical form)");
  });

  it("leaves out a method the run did not use and says when a method found no valid circle", () => {
    expect(
      fsLineOf(
        sliceTableToCsv(SLICES, { method: "bishop", fs: runFs(["bishop"], { fsBishop: 1.5, fsFellenius: null }) }),
      ),
    ).toBe("# FS: Bishop 1.500");
    const none = runFs(["bishop", "fellenius"], { fsBishop: null, fsFellenius: 0.98 });
    expect(fsLineOf(sliceTableToCsv(SLICES, { method: "fellenius", fs: none }))).toBe(
      "# FS: Bishop no valid circle; ordinary 0.980",
    );
  });
});
