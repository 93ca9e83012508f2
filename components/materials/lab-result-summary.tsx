import { BJERRUM_SOURCE, type UndrainedStrengthResult } from "@/lib/lab";
import type { LabTestRecord } from "@/lib/materials/lab-kinds";
import { formatScientific, formatValue } from "@/lib/materials/parameter-form";

type Row = [label: string, value: string, unit: string];

const sciK = (k: number) => formatScientific(k);

function rowsOf(record: LabTestRecord): Row[] {
  switch (record.kind) {
    case "direct-shear":
    case "triaxial-cu": {
      const r = record.result;
      const rows: Row[] = [
        ["Cohesion intercept c′", formatValue(r.cohesion, 1), "kPa"],
        ["Friction angle φ′", formatValue(r.frictionAngle, 1), "°"],
        ["R² of the fit", formatValue(r.fit.rSquared, 3), ""],
        ["Scatter about the line", formatValue(r.fit.standardError, 1), "kPa"],
        ["Tests used", String(r.fit.n), ""],
      ];
      if (record.kind === "direct-shear" && record.data.zeroCohesion)
        rows.splice(2, 0, ["Line forced through the origin", "yes", ""]);
      if (record.kind === "triaxial-cu" && record.result.totalStress) {
        const t = record.result.totalStress;
        rows.push(
          ["R envelope (total stress at failure): cR", formatValue(t.cohesion, 1), "kPa"],
          ["R envelope: φR", formatValue(t.frictionAngle, 1), "°"],
          ["R² of the R-envelope fit", formatValue(t.fit.rSquared, 3), ""],
        );
      }
      return rows;
    }
    case "undrained": {
      const r = record.result;
      const vane = vaneRows(r);
      if (r.model === "constant") {
        return [
          ...vane,
          [vane.length > 0 ? "Mean su, corrected" : "Mean su", formatValue(r.su, 1), "kPa"],
          ["Standard deviation", formatValue(r.standardDeviation, 1), "kPa"],
          ["Coefficient of variation", formatValue(r.coefficientOfVariation, 2), ""],
          ["Tests used", String(r.n), ""],
        ];
      }
      return [
        ...vane,
        [vane.length > 0 ? "su at the datum, corrected" : "su at the datum", formatValue(r.su, 1), "kPa"],
        ["Increase with depth", formatValue(r.suGradient, 2), "kPa/m"],
        ["Datum elevation", formatValue(r.suDatum, 2), "m"],
        ["R² of the fit", formatValue(r.fit.rSquared, 3), ""],
        ["Tests used", String(r.n), ""],
      ];
    }
    case "compaction": {
      const r = record.result;
      return [
        ["Maximum dry density", formatValue(r.maxDryDensity, 3), "Mg/m³"],
        ["Optimum moisture content", formatValue(r.optimumMoistureContent, 1), "%"],
        [`Acceptance density (${r.acceptance.percent} %)`, formatValue(r.acceptance.dryDensity, 3), "Mg/m³"],
        [
          "Moisture window",
          `${formatValue(r.acceptance.dryLimit.moistureContent, 1)} – ${formatValue(r.acceptance.wetLimit.moistureContent, 1)}`,
          "%",
        ],
        ["Bulk unit weight at optimum γ", formatValue(r.unitWeight, 1), "kN/m³"],
        ["Saturated unit weight γsat", formatValue(r.saturatedUnitWeight, 1), "kN/m³"],
        [
          "Void ratio, saturation",
          `${formatValue(r.voidRatio, 3)}, ${formatValue(r.degreeOfSaturation * 100, 0)} %`,
          "",
        ],
      ];
    }
    case "atterberg": {
      const r = record.result;
      return [
        ["Liquid limit LL", formatValue(r.liquidLimit, 0), "%"],
        ["Plastic limit PL", formatValue(r.plasticLimit, 0), "%"],
        ["Plasticity index PI", formatValue(r.plasticityIndex, 0), "%"],
        ["Liquidity index", formatValue(r.liquidityIndex, 2), ""],
        ["A-line at this LL", formatValue(r.aLinePI, 1), "%"],
      ];
    }
    case "permeability": {
      const r = record.result;
      return [
        [r.method === "falling-head" ? "Falling-head test" : "Constant-head test", `${r.readings.length} readings`, ""],
        ...r.readings.map((x): Row => [
          `k of reading ${x.index}${x.specimen ? ` (${x.specimen})` : ""}`,
          sciK(x.k),
          "m/s",
        ]),
        ["kh, geometric mean", sciK(r.k), "m/s"],
        ["Largest over smallest reading", formatValue(r.spread, 2), ""],
        ["Formulas", r.source, ""],
      ];
    }
  }
}

/** The vane correction and the measured mean beside the corrected values; none without a correction. */
function vaneRows(r: UndrainedStrengthResult): Row[] {
  const c = r.vaneCorrection;
  if (!c || c.basis === "none") return [];
  const measured = r.points.map((p) => p.measuredSu).filter((v): v is number => v !== undefined);
  const mean = measured.length > 0 ? measured.reduce((s, v) => s + v, 0) / measured.length : null;
  return [
    [
      c.basis === "bjerrum" ? `Bjerrum's μ at PI ${c.plasticityIndex} %` : "Correction factor given",
      formatValue(c.factor, 3),
      "",
    ],
    ["Mean vane su, as measured", formatValue(mean, 1), "kPa"],
  ];
}

/** Each vane reading as measured and as corrected, so the raw values stay in view. */
function VaneReadings({ r }: { r: UndrainedStrengthResult }) {
  if (!r.vaneCorrection || r.vaneCorrection.basis === "none") return null;
  return (
    <table className="w-full text-xs tabular-nums" data-testid="vane-readings">
      <thead className="text-ink-soft">
        <tr>
          <th className="py-0.5 text-left font-medium">Test</th>
          <th className="py-0.5 text-right font-medium">Vane su as measured (kPa)</th>
          <th className="py-0.5 text-right font-medium">× {formatValue(r.vaneCorrection.factor, 3)} = su used (kPa)</th>
        </tr>
      </thead>
      <tbody>
        {r.points.map((p) => (
          <tr key={p.index} className="border-t border-rule/60">
            <td className="py-0.5">{p.specimen ?? p.index}</td>
            <td className="py-0.5 text-right">{formatValue(p.measuredSu ?? null, 1)}</td>
            <td className="py-0.5 text-right">{formatValue(p.su, 1)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The derived numbers of a test set, with units, its warnings and (for limits) the chart hint. */
export function LabResultSummary({ record }: { record: LabTestRecord }) {
  return (
    <div className="space-y-2 text-sm" data-testid="lab-result">
      <table className="w-full">
        <tbody>
          {rowsOf(record).map(([label, value, unit]) => (
            <tr key={label} className="border-b border-rule/60 last:border-0">
              <th className="py-1 pr-3 text-left font-normal text-ink-soft">{label}</th>
              <td className="py-1 text-right font-medium tabular-nums">{value}</td>
              <td className="w-14 py-1 pl-1.5 text-xs text-ink-faint">{unit}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {record.kind === "undrained" ? <VaneReadings r={record.result} /> : null}
      {record.kind === "undrained" && record.result.vaneCorrection?.basis === "bjerrum" ? (
        <p className="text-xs text-ink-faint">Source of μ: {BJERRUM_SOURCE}.</p>
      ) : null}
      {record.kind === "atterberg" ? (
        <p className="rounded-md bg-paper-sunk px-3 py-2 text-xs text-ink-soft">
          <strong className="text-ink">Hint: {record.result.hint.group}.</strong> {record.result.hint.explanation}
        </p>
      ) : null}
      {record.result.warnings.length > 0 ? (
        <ul className="list-disc space-y-0.5 pl-5 text-xs text-clay-700">
          {record.result.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
