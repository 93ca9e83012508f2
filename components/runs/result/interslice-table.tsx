import type { SolutionChoice } from "@/lib/runs/view/surface-overlay";

const f1 = (v: number) => v.toFixed(1);
const f2 = (v: number) => v.toFixed(2);

/**
 * One rigorous solution slice by slice, folded by default: each slice's base forces and the
 * forces between it and the next slice (E normal, X shear, and the height E acts at).
 */
export function IntersliceTable({ choice, defaultOpen = false }: { choice: SolutionChoice; defaultOpen?: boolean }) {
  const { sol } = choice;
  return (
    <details className="panel p-3 text-sm" open={defaultOpen} data-testid="interslice-table">
      <summary className="cursor-pointer font-semibold">
        Forces between slices: {choice.label} (FS {sol.fs !== null ? sol.fs.toFixed(3) : "—"}
        {sol.lambda !== null ? `, λ = ${sol.lambda.toFixed(3)}` : ""})
      </summary>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full text-right text-xs tabular-nums">
          <thead className="text-ink-soft">
            <tr>
              <th className="px-2 py-1 text-left font-medium">Slice</th>
              <th className="px-2 py-1 font-medium">x left–right (m)</th>
              <th className="px-2 py-1 font-medium">Base angle α (°)</th>
              <th className="px-2 py-1 font-medium">N′ (kN/m)</th>
              <th className="px-2 py-1 font-medium">Shear mobilised (kN/m)</th>
              <th className="px-2 py-1 font-medium">mα</th>
              <th className="px-2 py-1 font-medium">E right side (kN/m)</th>
              <th className="px-2 py-1 font-medium">X right side (kN/m)</th>
              <th className="px-2 py-1 font-medium">E acts at y (m)</th>
            </tr>
          </thead>
          <tbody>
            {sol.slices.map((s, i) => {
              const b = sol.boundaries[i + 1];
              const tension = b && b.normal < 0;
              return (
                <tr key={i} className="border-t border-rule" data-testid="interslice-row">
                  <td className="px-2 py-0.5 text-left">{i + 1}</td>
                  <td className="px-2 py-0.5">
                    {f2(s.xLeft)}–{f2(s.xRight)}
                  </td>
                  <td className="px-2 py-0.5">{f1(s.alpha)}</td>
                  <td className={`px-2 py-0.5 ${s.normal < 0 ? "text-alarm-700" : ""}`}>{f1(s.normal)}</td>
                  <td className="px-2 py-0.5">{f1(s.shear)}</td>
                  <td className="px-2 py-0.5">{s.mAlpha.toFixed(3)}</td>
                  <td className={`px-2 py-0.5 ${tension ? "text-alarm-700" : ""}`}>{b ? f1(b.normal) : "—"}</td>
                  <td className="px-2 py-0.5">{b ? f1(b.shear) : "—"}</td>
                  <td className="px-2 py-0.5">{b && b.thrustY !== null ? f2(b.thrustY) : "—"}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
        <p className="mt-1 text-left text-xs text-ink-faint">
          Slices numbered left to right. E is positive in compression; a negative E (marked) is tension, which soil does
          not carry.
        </p>
      </div>
    </details>
  );
}
