import { describe, expect, test } from "vitest";
import fc from "fast-check";
import {
  geometryToCsv,
  materialsToCsv,
  parseGeometryCsv,
  parseMaterialsCsv,
  parsePhreaticCsv,
  phreaticToCsv,
  type Point,
  type SectionMaterial,
} from "@/lib/section-io";

// Any finite double, −0 folded into 0 (a CSV cell cannot tell them apart).
const coordinate = fc
  .double({ noNaN: true, noDefaultInfinity: true, min: -1e9, max: 1e9 })
  .map((v) => (v === 0 ? 0 : v));
// Text as a user might type it: trimmed, non-empty, including characters that need quoting
// (comma, quote, semicolon) and leading formula characters (OWASP CSV injection).
const label = fc
  .tuple(fc.constantFrom("", "=", "+", "-", "@", "'=", "''-"), fc.string({ minLength: 1, maxLength: 12 }))
  .map(([prefix, body]) => (prefix + body).trim())
  .filter((s) => s !== "" && !/[\r\n]/.test(s));

/** A triangle of clearly non-zero area, not repeating its first point. */
const triangle = fc
  .tuple(coordinate, coordinate, fc.double({ min: 0.5, max: 1e4, noNaN: true }))
  .map(([x, y, size]): Point[] => [
    [x, y],
    [x + size, y],
    [x, y + size],
  ]);

describe("section CSV round trips (fast-check)", () => {
  test("parseGeometryCsv(geometryToCsv(regions)) gives the regions back", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ material: label, points: triangle }), { minLength: 1, maxLength: 5 }),
        (regions) => {
          // Regions without names are written as R1, R2, …, and read back under those names.
          const r = parseGeometryCsv(geometryToCsv(regions));
          expect(r.ok && r.value).toEqual(regions.map((g, i) => ({ name: `R${i + 1}`, ...g })));
        },
      ),
      { numRuns: 200 },
    );
  });

  test("parsePhreaticCsv(phreaticToCsv(points)) gives the points back", () => {
    const line = fc
      .uniqueArray(coordinate, { minLength: 2, maxLength: 30 })
      .chain((xs) =>
        fc
          .array(coordinate, { minLength: xs.length, maxLength: xs.length })
          .map((ys) => [...xs].sort((a, b) => a - b).map((x, i): Point => [x, ys[i]])),
      );
    fc.assert(
      fc.property(line, (points) => {
        const r = parsePhreaticCsv(phreaticToCsv(points));
        expect(r.ok && r.value).toEqual(points);
      }),
      { numRuns: 200 },
    );
  });

  test("parseMaterialsCsv(materialsToCsv(materials, names)) gives materials and names back", () => {
    const mc = fc.record(
      {
        id: label,
        model: fc.constant("mohr-coulomb" as const),
        gamma: fc.double({ min: 14, max: 24, noNaN: true }),
        gammaSat: fc.double({ min: 24, max: 26, noNaN: true }),
        c: fc.double({ min: 0, max: 200, noNaN: true }),
        phi: fc.double({ min: 0, max: 45, noNaN: true }),
      },
      { requiredKeys: ["id", "model", "gamma", "c", "phi"] },
    );
    const su = fc
      .record({
        id: label,
        model: fc.constant("undrained" as const),
        gamma: fc.double({ min: 14, max: 24, noNaN: true }),
        su: fc.double({ min: 1, max: 500, noNaN: true }),
        grad: fc.option(fc.tuple(fc.double({ min: 0, max: 10, noNaN: true }), coordinate), { nil: undefined }),
      })
      .map(({ grad, ...m }): SectionMaterial => (grad ? { ...m, suGradient: grad[0], suDatum: grad[1] } : m));
    const rigid = fc.record({ id: label, model: fc.constant("impenetrable" as const) });
    const materials = fc.uniqueArray(fc.oneof(mc, su, rigid) as fc.Arbitrary<SectionMaterial>, {
      selector: (m) => m.id,
      minLength: 1,
      maxLength: 6,
    });
    fc.assert(
      fc.property(materials, fc.array(label, { maxLength: 6 }), (list, nameList) => {
        const names = Object.fromEntries(list.flatMap((m, i) => (nameList[i] ? [[m.id, nameList[i]]] : [])));
        const r = parseMaterialsCsv(materialsToCsv(list, names));
        expect(r.ok && r.value).toEqual({ materials: list, names });
      }),
      { numRuns: 200 },
    );
  });
});

test("parseMaterialsCsv keeps the name of a material whose id is __proto__ (found by fast-check)", () => {
  const r = parseMaterialsCsv(
    "id,name,model,gamma,gammaSat,c,phi,su,suGradient,suDatum\n__proto__,Odd id,mohr-coulomb,19,,5,30,,,\n",
  );
  expect(r.ok && Object.getOwnPropertyDescriptor(r.value.names, "__proto__")?.value).toBe("Odd id");
});
