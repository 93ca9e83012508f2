/**
 * How each sweep case is drawn: colours from the Okabe–Ito set (told apart with the common
 * kinds of colour blindness), and a dash pattern and marker of its own so the chart also reads
 * in grey print.
 */
import type { SweepCaseKey } from "./sweep-plan";

export interface CaseStyle {
  colour: string;
  /** SVG stroke-dasharray; "" for a solid line. */
  dash: string;
  marker: "circle" | "square" | "triangle";
  short: string;
}

export const CASE_STYLES: Record<SweepCaseKey, CaseStyle> = {
  "steady-seepage": { colour: "#0072B2", dash: "", marker: "circle", short: "Downstream, steady seepage" },
  "drawdown-storage": {
    colour: "#D55E00",
    dash: "8 4",
    marker: "square",
    short: "Upstream, drawdown from normal pool",
  },
  "drawdown-surcharge": {
    colour: "#009E73",
    dash: "2 3",
    marker: "triangle",
    short: "Upstream, drawdown from flood pool",
  },
};
