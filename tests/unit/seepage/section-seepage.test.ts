import { describe, expect, it } from "vitest";
import { validateSection, type SectionDocument } from "@/lib/stability";
import { runSeepage } from "@/lib/seepage";
import { checkWaterConditions } from "@/lib/sections/check-water-conditions";
import { waterConditionsOf } from "@/lib/sections/water-conditions";
import { buildSeepageDocument } from "@/lib/section-seepage/document";
import { checkDrains } from "@/lib/section-seepage/check-drains";
import { drainsFromText, drainsToText } from "@/lib/section-seepage/drain-text";
import { settingsFromForm, settingsToForm } from "@/lib/section-seepage/settings-form";
import { toEngineMaterial } from "@/lib/materials/engine-material";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import type { MaterialConductivity } from "@/lib/section-seepage/types";
import {
  CORE_PERMEABILITY_SET,
  ZONED_MATERIALS,
  ZONED_POOL,
  ZONED_SEEPAGE_SETTINGS,
  buildZonedDamSection,
} from "@/db/seeds/demo-zoned-dam";

const coreK = (() => {
  const o = checkAndDeriveLabTest("permeability", CORE_PERMEABILITY_SET.data);
  if (!o.ok || o.record.kind !== "permeability") throw new Error("demo permeability set");
  return Number(o.record.result.k.toPrecision(2));
})();
const library: MaterialConductivity[] = ZONED_MATERIALS.map((m) => {
  const p = m.parameters as { k?: number; kRatio?: number };
  return { key: m.key, name: m.name, k: m.key === "core" ? coreK : p.k, kRatio: p.kRatio };
});
const section = buildZonedDamSection(ZONED_MATERIALS.map((m) => toEngineMaterial({ ...m })));
const condition = waterConditionsOf(section)[0];

describe("pools set in the seepage view", () => {
  it("replace the water condition's on their side, and a lower pool passes less water", () => {
    const own = buildSeepageDocument(section, condition, library, ZONED_SEEPAGE_SETTINGS);
    const lower = buildSeepageDocument(section, condition, library, { ...ZONED_SEEPAGE_SETTINGS, pools: { left: 18 } });
    if (!own.ok || !lower.ok) throw new Error("demo document");
    expect(own.document.seepage.pools).toEqual([
      { side: "left", level: ZONED_POOL },
      { side: "right", level: 6 },
    ]);
    expect(lower.document.seepage.pools).toEqual([
      { side: "left", level: 18 },
      { side: "right", level: 6 },
    ]);
    // Darcy's law (fact of physics): q grows with the head lost, so 5 m less pool passes less water.
    const [a, b] = [runSeepage(own.document), runSeepage(lower.document)];
    if (!a.ok || !b.ok) throw new Error("demo solve");
    expect(b.solution.q).toBeLessThan(a.solution.q);
  });
});

describe("the demo zoned dam", () => {
  it("is a section the engine accepts, with valid water conditions", () => {
    expect(validateSection(section).ok).toBe(true);
    expect(checkWaterConditions(section as SectionDocument).errors).toEqual([]);
    expect(checkDrains(section, ZONED_SEEPAGE_SETTINGS)).toEqual({});
  });

  it("takes the core's kh from its falling-head set: of the order of a rolled clay core", () => {
    // Compacted clay cores are about 10⁻⁹ to 10⁻⁸ m/s (common practice; Cedergren, from memory).
    expect(coreK).toBeGreaterThan(1e-9);
    expect(coreK).toBeLessThan(1e-8);
  });

  it("solves to a flow net whose flows balance and whose pool stands in the upstream shell", () => {
    const built = buildSeepageDocument(section, condition, library, ZONED_SEEPAGE_SETTINGS);
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    const run = runSeepage(built.document);
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    const s = run.solution;
    // Inflow and outflow balance within 1 % (issue 14, item 2: conservation of water).
    expect(Math.abs(s.qIn - s.qOut) / s.q).toBeLessThan(0.01);
    // q and qTotal are each rounded to six significant figures.
    expect(Math.abs(s.qTotal! / (s.q * 320) - 1)).toBeLessThan(1e-5);
    // A shell a thousand times more pervious than the core loses almost no head: the phreatic
    // surface stays near the pool up to the core (fact of the trade for zoned dams).
    const atCoreFace = s.phreatic.filter(([x]) => x > 55 && x < 62).map(([, y]) => y);
    expect(Math.min(...atCoreFace)).toBeGreaterThan(ZONED_POOL - 1);
    // The head lost is pool minus tailwater, and the hand check k·ΔH·Nf/Nd is of the same order as q.
    expect(s.flowNet.deltaH).toBeCloseTo(ZONED_POOL - 6, 6);
    expect(s.flowNet.qFlowNet / s.q).toBeGreaterThan(0.5);
    expect(s.flowNet.qFlowNet / s.q).toBeLessThan(2);
    expect(s.exitGradients.length).toBeGreaterThan(0);
  });
});

describe("buildSeepageDocument", () => {
  it("names a material with no kh in the library and where to set it", () => {
    const noCore = library.map((c) => (c.key === "core" ? { key: c.key, name: c.name } : c));
    const built = buildSeepageDocument(section, condition, noCore, ZONED_SEEPAGE_SETTINGS);
    expect(built.ok).toBe(false);
    if (!built.ok) {
      expect(built.errors).toHaveLength(1);
      expect(built.errors[0].path).toBe("materials[0].k");
      expect(built.errors[0].message).toMatch(/'core'.*materials library/);
    }
  });

  it("takes the pool from the water condition and the tailwater only on a dry side", () => {
    const built = buildSeepageDocument(section, condition, library, ZONED_SEEPAGE_SETTINGS);
    expect(built.ok && built.document.seepage.pools).toEqual([
      { side: "left", level: ZONED_POOL },
      { side: "right", level: 6 },
    ]);
  });
});

describe("checkDrains", () => {
  it("names a drain point outside the section", () => {
    const fields = checkDrains(section, {
      drains: [
        [
          [108, 6],
          [150, 6],
        ],
      ],
    });
    expect(Object.keys(fields)).toEqual(["settings.drains[0][1]"]);
    expect(fields["settings.drains[0][1]"][0]).toMatch(/Drain 1, point 2 \(150, 6\) lies outside the section/);
  });
});

describe("drains typed as text", () => {
  it("reads one drain per line and writes it back the same way", () => {
    const text = "108 6; 128 6\n90 6; 90 12.5; 92.5 12.5";
    const r = drainsFromText(text);
    expect(r).toEqual({
      ok: true,
      drains: [
        [
          [108, 6],
          [128, 6],
        ],
        [
          [90, 6],
          [90, 12.5],
          [92.5, 12.5],
        ],
      ],
    });
    if (r.ok) expect(drainsToText(r.drains)).toBe(text);
  });

  it("names the drain and point of a bad number, and a drain of one point", () => {
    const r = drainsFromText("108 6; 128,5 6\n100 7");
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problems[0]).toMatch(/^Drain 1, point 2: .*comma/);
      expect(r.problems[1]).toBe("Drain 2: a drain needs at least 2 points.");
    }
  });
});

describe("the seepage settings form", () => {
  const blank = {
    drains: "",
    meshSize: "",
    crestLength: "",
    headDrops: "",
    tailwaterSide: "",
    tailwaterLevel: "",
    poolLeft: "",
    poolRight: "",
  } as const;

  it("reads back what it writes, the demo's settings included", () => {
    expect(settingsFromForm(settingsToForm(ZONED_SEEPAGE_SETTINGS))).toEqual({
      ok: true,
      settings: ZONED_SEEPAGE_SETTINGS,
    });
  });

  it("keeps pool levels typed (or dragged) in the view, and a bad one is named", () => {
    const withPools = { ...ZONED_SEEPAGE_SETTINGS, pools: { left: 21.5 } };
    expect(settingsFromForm(settingsToForm(withPools))).toEqual({ ok: true, settings: withPools });
    const bad = settingsFromForm({ ...blank, poolRight: "6,5" });
    expect(!bad.ok && bad.fields.poolRight[0]).toMatch(/Right pool level/);
  });

  it("names each bad field: a decimal comma, a tailwater side without its level, too few head drops", () => {
    const r = settingsFromForm({ ...blank, crestLength: "320,5", tailwaterSide: "right", headDrops: "1" });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.fields.crestLength[0]).toMatch(/comma/);
      expect(r.fields.tailwaterLevel[0]).toMatch(/tailwater level/);
    }
    const drops = settingsFromForm({ ...blank, headDrops: "1" });
    expect(!drops.ok && drops.fields.headDrops[0]).toMatch(/At least 2 head drops/);
  });
});
