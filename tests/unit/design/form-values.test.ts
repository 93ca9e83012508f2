import { describe, expect, test } from "vitest";
import { embankmentParamsSchema, fromFormValues, textToLine, toFormValues } from "@/lib/design";
import { params } from "./helpers";

describe("toFormValues / fromFormValues", () => {
  test("round-trips parameters with berms, a core and a hand-drawn line", () => {
    const p = params({
      upstreamBerm: { elevation: 12, width: 4 },
      zoning: { kind: "zoned", core: "fill", shell: "foundation", coreTopWidth: 3, coreSlope: 0.4 },
      handLines: {
        normal: [
          [0, 16],
          [50, 10.5],
        ],
        flood: null,
      },
    });
    expect(embankmentParamsSchema.parse(fromFormValues(toFormValues(p)))).toEqual(p);
  });

  test("a decimal comma is read as a point; a blank field reports its own message", () => {
    const v = toFormValues(params());
    const r = embankmentParamsSchema.safeParse(fromFormValues({ ...v, upstreamSlope: "3,25", crestWidth: " " }));
    expect(r.error!.issues.map((i) => i.path.join("."))).toEqual(["crestWidth"]);
  });

  test("textToLine turns a malformed row into NaN so the schema names it", () => {
    expect(textToLine("0, 16\n10 15\nabc")).toEqual([
      [0, 16],
      [10, 15],
      [NaN, NaN],
    ]);
    expect(textToLine("  \n")).toBeNull();
  });
});
