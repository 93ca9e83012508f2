import Link from "next/link";
import type { MaterialConductivity } from "@/lib/section-seepage/types";
import { formatScientific, formatValue } from "@/lib/materials/parameter-form";

export interface ConductivityRow {
  id: string;
  name?: string;
  impenetrable: boolean;
  conductivity: MaterialConductivity | null;
  /** The library material's page, or null when the section's material is not in the library. */
  libraryHref: string | null;
}

/** kh and kv/kh of each material of the section, with where kh came from; edited in the library. */
export function ConductivityTable({ rows }: { rows: ConductivityRow[] }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-sm" data-testid="conductivity-table">
        <thead className="bg-paper-sunk text-left text-xs text-ink-soft">
          <tr>
            <th className="px-3 py-2 font-medium">Material</th>
            <th className="px-3 py-2 text-right font-medium">
              kh <span className="font-normal text-ink-faint">(m/s)</span>
            </th>
            <th className="px-3 py-2 text-right font-medium">kv/kh</th>
            <th className="px-3 py-2 font-medium">Source of kh</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => {
            const c = r.conductivity;
            return (
              <tr key={r.id} className="border-t border-rule" data-material={r.id}>
                <td className="px-3 py-1.5">
                  {r.name ?? r.id} <span className="font-mono text-xs text-ink-faint">{r.id}</span>
                </td>
                {r.impenetrable ? (
                  <td colSpan={3} className="px-3 py-1.5 text-ink-soft">
                    Impenetrable: no flow through it
                  </td>
                ) : (
                  <>
                    <td className="px-3 py-1.5 text-right tabular-nums">
                      {c?.k !== undefined ? formatScientific(c.k) : <span className="text-alarm-700">not set</span>}
                    </td>
                    <td className="px-3 py-1.5 text-right tabular-nums">{formatValue(c?.kRatio ?? 1, 2)}</td>
                    <td className="px-3 py-1.5 text-ink-soft">
                      {c?.sourceSetId !== undefined
                        ? `permeability set #${c.sourceSetId}`
                        : c?.k !== undefined
                          ? "typed"
                          : "—"}
                      {r.libraryHref ? (
                        <Link href={r.libraryHref} className="ml-2 text-clay-600 hover:underline">
                          edit in the library
                        </Link>
                      ) : null}
                    </td>
                  </>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
