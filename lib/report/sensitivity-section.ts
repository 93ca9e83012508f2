/**
 * The report's sensitivity section, written only when asked: each input moved down and up with
 * the others held, largest FS swing first, as the server's own searches found them.
 */
import type { ReportWriter } from "./report-writer";
import { SOFT } from "./report-writer";
import type { TornadoBar } from "@/lib/sensitivity/sensitivity";

export interface ReportSensitivity {
  /** "±10 % of each value" or "one standard deviation". */
  variation: string;
  method: string;
  baseFs: number;
  bars: readonly TornadoBar[];
}

const num = (v: number | null, digits: number) => (v === null ? "—" : v.toFixed(digits));

export function writeSensitivity(w: ReportWriter, s: ReportSensitivity): void {
  w.heading("Sensitivity");
  w.paragraph(
    `Each input moved by ${s.variation}, one at a time, with the others at their kept values; ` +
      `${s.method}, kept FS ${s.baseFs.toFixed(3)}. Largest swing first.`,
    { size: 8.5, color: SOFT },
  );
  if (s.bars.length === 0) {
    w.paragraph("No input could be moved by this amount.");
    return;
  }
  w.table(
    [
      { header: "Input", width: 170 },
      { header: "Low value", width: 65, align: "right" },
      { header: "High value", width: 65, align: "right" },
      { header: "FS at low", width: 60, align: "right" },
      { header: "FS at high", width: 60, align: "right" },
      { header: "Swing", width: 55, align: "right" },
    ],
    s.bars.map((b) => [
      b.label,
      num(b.low, 2),
      num(b.high, 2),
      num(b.fsLow, 3),
      num(b.fsHigh, 3),
      b.fsLow === null || b.fsHigh === null ? "—" : b.swing.toFixed(3),
    ]),
  );
}
