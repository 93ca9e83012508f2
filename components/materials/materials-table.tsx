import Link from "next/link";
import type { LibraryMaterial } from "@/lib/materials/types";
import { MODEL_LABELS, PARAMETER_INFO, parameterValue, type ParameterKey } from "@/lib/materials/parameters";
import { formatScientific, formatValue } from "@/lib/materials/parameter-form";
import { SourceBadge } from "./source-badge";

const COLUMNS: { key: ParameterKey; digits: number }[] = [
  { key: "gamma", digits: 1 },
  { key: "gammaSat", digits: 1 },
  { key: "c", digits: 1 },
  { key: "phi", digits: 1 },
  { key: "su", digits: 1 },
  // Conductivity spans orders of magnitude: written as 4.9 × 10⁻⁸ (digits < 0 means that).
  { key: "k", digits: -1 },
];

/** The library as a table: one row per material, parameters with units and their lab sources. */
export function MaterialsTable({ projectId, materials }: { projectId: number; materials: LibraryMaterial[] }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-sm" data-testid="materials-table">
        <thead className="bg-paper-sunk text-left text-xs text-ink-soft">
          <tr>
            <th className="px-3 py-2 font-medium">Material</th>
            <th className="px-3 py-2 font-medium">Model</th>
            {COLUMNS.map(({ key }) => (
              <th key={key} className="px-3 py-2 text-right font-medium">
                {PARAMETER_INFO[key].symbol}{" "}
                <span className="font-normal text-ink-faint">({PARAMETER_INFO[key].unit})</span>
              </th>
            ))}
            <th className="px-3 py-2 text-right font-medium">Lab sets</th>
          </tr>
        </thead>
        <tbody>
          {materials.map((m) => (
            <tr key={m.id} className="border-t border-rule align-top">
              <td className="px-3 py-2">
                <span
                  className="mr-2 inline-block h-3 w-3 rounded-sm border border-ink/20 align-middle"
                  style={{ backgroundColor: m.color }}
                  aria-hidden
                />
                <Link href={`/projects/${projectId}/materials/${m.id}`} className="font-medium hover:text-clay-600">
                  {m.name}
                </Link>
                <div className="ml-5 font-mono text-xs text-ink-faint">{m.key}</div>
              </td>
              <td className="px-3 py-2 text-ink-soft">
                {MODEL_LABELS[m.parameters.model]}
                {"freeDraining" in m.parameters && m.parameters.freeDraining ? (
                  <div className="text-xs text-ink-faint">drains freely</div>
                ) : null}
              </td>
              {COLUMNS.map(({ key, digits }) => {
                const v = parameterValue(m.parameters, key);
                return (
                  <td key={key} className="px-3 py-2 text-right tabular-nums">
                    {digits < 0 ? formatScientific(v) : formatValue(v, digits)}
                    {key === "k" && parameterValue(m.parameters, "kRatio") !== undefined ? (
                      <div className="text-xs text-ink-faint">
                        kv/kh {formatValue(parameterValue(m.parameters, "kRatio"), 2)}
                      </div>
                    ) : null}
                    {key === "su" && parameterValue(m.parameters, "suGradient") ? (
                      <div className="text-xs text-ink-faint">
                        +{formatValue(parameterValue(m.parameters, "suGradient"), 2)} kPa/m
                      </div>
                    ) : null}
                    {v !== undefined ? (
                      <div>
                        <SourceBadge
                          setId={m.sources[key]}
                          href={`/projects/${projectId}/materials/${m.id}#lab-set-${m.sources[key]}`}
                        />
                      </div>
                    ) : null}
                  </td>
                );
              })}
              <td className="px-3 py-2 text-right tabular-nums text-ink-soft">{m.labTestCount}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
