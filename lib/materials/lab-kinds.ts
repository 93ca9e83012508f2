import type {
  AtterbergInputData,
  AtterbergResult,
  CompactionInputData,
  CompactionResult,
  DirectShearInputData,
  DirectShearResult,
  TriaxialCuInputData,
  TriaxialCuResult,
  PermeabilityInputData,
  PermeabilityResult,
  UndrainedStrengthInputData,
  UndrainedStrengthResult,
} from "@/lib/lab";
import type { ParameterKey } from "./parameters";

/** The kinds of lab test set the library stores (the `lab_test_sets.kind` column). */
export const LAB_TEST_KINDS = [
  "direct-shear",
  "triaxial-cu",
  "undrained",
  "compaction",
  "atterberg",
  "permeability",
] as const;
export type LabTestKind = (typeof LAB_TEST_KINDS)[number];

export interface LabInputByKind {
  "direct-shear": DirectShearInputData;
  "triaxial-cu": TriaxialCuInputData;
  undrained: UndrainedStrengthInputData;
  compaction: CompactionInputData;
  atterberg: AtterbergInputData;
  permeability: PermeabilityInputData;
}

export interface LabResultByKind {
  "direct-shear": DirectShearResult;
  "triaxial-cu": TriaxialCuResult;
  undrained: UndrainedStrengthResult;
  compaction: CompactionResult;
  atterberg: AtterbergResult;
  permeability: PermeabilityResult;
}

/** A lab test set's input and what was derived from it, tied together by `kind`. */
export type LabTestRecord = {
  [K in LabTestKind]: { kind: K; data: LabInputByKind[K]; result: LabResultByKind[K] };
}[LabTestKind];

/** One column of a kind's rows table; `unit` is shown in the header. */
export interface LabColumn {
  key: string;
  label: string;
  unit: string | null;
  numeric: boolean;
}

export interface LabKindInfo {
  label: string;
  /** Where the rows sit in the input (`tests`, `specimens`, `points`), or null for one sample. */
  rowsKey: "tests" | "specimens" | "points" | "readings" | null;
  columns: LabColumn[];
  /** Parameters of a material this kind can supply. */
  feeds: readonly ParameterKey[];
  /** Rows a fresh table starts with. */
  startRows: number;
}

const specimen: LabColumn = { key: "specimen", label: "Specimen", unit: null, numeric: false };
const num = (key: string, label: string, unit: string): LabColumn => ({ key, label, unit, numeric: true });

export const LAB_KIND_INFO: Record<LabTestKind, LabKindInfo> = {
  "direct-shear": {
    label: "Direct shear (shear box)",
    rowsKey: "tests",
    columns: [
      specimen,
      num("normalStress", "Normal stress σn", "kPa"),
      num("shearStress", "Peak shear stress τ", "kPa"),
    ],
    feeds: ["c", "phi"],
    startRows: 3,
  },
  "triaxial-cu": {
    label: "Triaxial, consolidated undrained, pore pressures measured",
    rowsKey: "specimens",
    columns: [
      specimen,
      num("cellPressure", "Cell pressure σ3", "kPa"),
      num("deviatorStress", "Deviator stress at failure q", "kPa"),
      num("porePressure", "Pore pressure at failure u", "kPa"),
    ],
    // Effective envelope from the effective circles, R envelope from the total-stress circles.
    feeds: ["c", "phi", "cR", "phiR"],
    startRows: 3,
  },
  undrained: {
    label: "Undrained strength (UU triaxial or field vane)",
    rowsKey: "tests",
    columns: [
      specimen,
      num("depth", "Depth", "m"),
      num("elevation", "Elevation", "m"),
      num("deviatorStress", "UU deviator stress q", "kPa"),
      num("su", "Vane su", "kPa"),
    ],
    feeds: ["su", "suGradient", "suDatum"],
    startRows: 3,
  },
  compaction: {
    label: "Compaction test",
    rowsKey: "points",
    columns: [
      specimen,
      num("moistureContent", "Moisture content w", "%"),
      num("dryDensity", "Dry density ρd", "Mg/m³"),
      num("bulkDensity", "Bulk density ρ", "Mg/m³"),
    ],
    feeds: ["gamma", "gammaSat"],
    startRows: 5,
  },
  atterberg: {
    label: "Atterberg limits",
    rowsKey: null,
    columns: [
      specimen,
      num("liquidLimit", "Liquid limit LL", "%"),
      num("plasticLimit", "Plastic limit PL", "%"),
      num("waterContent", "Natural water content w", "%"),
    ],
    feeds: [],
    startRows: 1,
  },
  permeability: {
    label: "Permeability (constant or falling head)",
    rowsKey: "readings",
    columns: [
      specimen,
      num("head", "Head h (falling head: start h1)", "mm"),
      num("headEnd", "End head h2 (falling head)", "mm"),
      num("time", "Time t", "s"),
      num("volume", "Water collected Q (constant head)", "mL"),
    ],
    feeds: ["k"],
    startRows: 3,
  },
};

/** The noun lib/lab uses in its row messages ("test 3: …"). */
export const LAB_ROW_NOUN = "test";
