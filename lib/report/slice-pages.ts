/** The slice tables of a run's critical circles, on landscape pages so every column fits. */
import type { SliceRow } from "@/lib/stability";
import { formatCell, isStagedSlices, numberSlices, sliceColumns } from "@/lib/runs/view/slice-columns";
import { METHOD_NAME } from "@/lib/runs/view/warning-text";
import { A4_LANDSCAPE, SOFT, type ReportWriter } from "./report-writer";
import { pdfSafe, wrapText } from "./pdf-text";

type Method = "bishop" | "fellenius";

export function writeSliceTable(
  w: ReportWriter,
  tables: Partial<Record<Method, { slices: SliceRow[]; minMAlpha: number | null }>>,
  methods: readonly Method[],
): void {
  for (const method of methods) {
    const table = tables[method];
    if (!table) continue;
    w.newPage(A4_LANDSCAPE);
    w.heading(`Slices of the critical circle — ${METHOD_NAME[method]}`);
    w.paragraph(
      "Lengths m, forces kN per metre run, pressures kPa, angles degrees. Slices numbered from the first slice of the slip mass.",
      { size: 7.5, color: SOFT },
    );
    if (method === "bishop" && table.minMAlpha !== null)
      w.paragraph(`Smallest mα on this circle: ${table.minMAlpha.toFixed(3)}.`, { size: 7.5, color: SOFT });
    const staged = isStagedSlices(table.slices);
    if (staged)
      w.paragraph(
        "Staged drawdown: c and φ are the final stage's strengths — total-stress (c = τff, φ = 0, no pore " +
          "pressure) where the undrained strength governs, c′ and φ′ where the drained strength is lower.",
        { size: 7.5, color: SOFT },
      );
    const cols = sliceColumns(method, staged);
    const fixed = cols.map((c): number =>
      c.key === "material" ? 62 : c.key === "governs" ? 72 : c.key === "index" ? 24 : 0,
    );
    // Each other column gets at least its longest header word, then an equal share of what is left.
    const longestWord = (c: (typeof cols)[number]) =>
      Math.max(
        ...pdfSafe(c.label, w.bold)
          .split(/ +/)
          .map((word) => w.bold.widthOfTextAtSize(word, 7)),
      ) + 6;
    const least = cols.map((c, i) => (fixed[i] ? 0 : longestWord(c)));
    const spare = w.width - fixed.reduce((s, v) => s + v, 0) - least.reduce((s, v) => s + v, 0);
    const share = Math.max(0, spare) / Math.max(1, fixed.filter((v) => v === 0).length);
    const widths = cols.map((_, i) => fixed[i] || least[i] + share);
    w.table(
      cols.map((c, i) => ({
        // Labels wrap onto as many lines as the column needs, so none is cut short.
        header: [...wrapText(c.label, w.bold, 7, widths[i] - 4), ...(c.unit ? [`(${c.unit})`] : [])].join("\n"),
        width: widths[i],
        align: c.decimals === null ? ("left" as const) : ("right" as const),
      })),
      numberSlices(table.slices).map((s) => cols.map((c) => formatCell(c, c.value(s, method)))),
      7,
    );
  }
}
