/**
 * The report's pages for Spencer, Morgenstern–Price and a drawn slip surface: the methods side by
 * side, the surface and line of thrust drawn on the section, the warnings with their place, and
 * the forces between slices of each solution (the same words as the result view).
 */
import { rgb } from "pdf-lib";
import type { GridSearchSuccess, SectionDocument, XY } from "@/lib/stability";
import type { RigorousRunPart } from "@/lib/runs/record/rigorous-part";
import { formatFs } from "@/lib/runs/view/verdict";
import { INTERSLICE_NAME, methodRows, placeText, type MethodCell } from "@/lib/runs/view/rigorous-text";
import { solutionChoices } from "@/lib/runs/view/surface-overlay";
import { drawSection } from "./section-drawing";
import { ALARM, SOFT, type ReportWriter } from "./report-writer";

const SURFACE = rgb(0.17, 0.36, 0.48);
const THRUST = rgb(0.64, 0.28, 0.12);
const SEARCHED = rgb(0.15, 0.15, 0.2);

function cellText(c: MethodCell): string {
  if (c === null) return "—";
  if ("note" in c) return c.note;
  return c.lambda !== null ? `${formatFs(c.fs)} (λ ${c.lambda.toFixed(3)})` : formatFs(c.fs);
}

export function writeRigorous(
  w: ReportWriter,
  run: { document: SectionDocument; result: GridSearchSuccess & { rigorous?: RigorousRunPart } },
): void {
  const part = run.result.rigorous;
  if (!part) return;
  w.heading("Methods side by side");
  const rows = methodRows(run.result, part);
  w.table(
    [
      { header: "Method", width: 130 },
      { header: "Critical circle", width: 120 },
      { header: "Searched surface", width: 120 },
      { header: "Drawn surface", width: w.width - 370 },
    ],
    rows.map((r) => [
      r.name,
      cellText(r.circle),
      part.search === "surfaces" ? cellText(r.searched) : "circles only searched",
      part.surface ? cellText(r.surface) : "no surface drawn",
    ]),
    8.5,
  );
  w.paragraph(
    `Morgenstern–Price with a ${INTERSLICE_NAME[part.interslice]}; λ scales the interslice shear X = λ·f(x)·E ` +
      "(for Spencer, tan of the constant interslice inclination). Bishop's simplified and the ordinary method " +
      "assume a circle and give no factor on a drawn surface.",
    { size: 7.5, color: SOFT },
  );
  const choices = solutionChoices(part);
  const pts = (line: readonly XY[]) => line.map((p) => placeText(p).replace(" m", "")).join(", ");
  const s = part.surface;
  if (s && s.surface.length > 1) w.paragraph(`Drawn slip surface: ${pts(s.surface)} m.`, { size: 8.5 });
  const searched = part.searched.spencer ?? part.searched["morgenstern-price"];
  if (searched?.surface) w.paragraph(`Searched slip surface (lowest): ${pts(searched.surface)} m.`, { size: 8.5 });
  const shown = choices.find((c) => !c.key.startsWith("circle-"));
  if (shown) {
    w.ensure(320);
    drawSection(w, {
      document: run.document,
      critical: {},
      lines: [
        ...(s && s.surface.length > 1 ? [{ points: s.surface, color: SURFACE, width: 1.8 }] : []),
        ...(searched?.surface ? [{ points: searched.surface, color: SEARCHED, width: 1.5, dash: [6, 2] }] : []),
        { points: shown.sol.thrustLine, color: THRUST, width: 1.2, dash: [4, 2] },
      ],
    });
    w.paragraph(
      "Solid blue-grey: the drawn slip surface; long dashes, dark: the searched surface; short dashes, rust: " +
        `the line of thrust of ${shown.label}.`,
      { size: 7.5, color: SOFT },
    );
  }
  for (const c of choices) {
    for (const l of c.lines)
      w.paragraph(`CHECK (${c.label}): ${l.headline}${l.place ? `, ${l.place}` : ""}.`, { color: ALARM, size: 8.5 });
    w.heading(`Forces between slices: ${c.label}`, 10);
    w.table(
      [
        { header: "Slice", width: 35 },
        { header: "x left–right (m)", width: 90, align: "right" },
        { header: "α (°)", width: 45, align: "right" },
        { header: "N′ (kN/m)", width: 60, align: "right" },
        { header: "mα", width: 45, align: "right" },
        { header: "E right (kN/m)", width: 70, align: "right" },
        { header: "X right (kN/m)", width: 70, align: "right" },
        { header: "E at y (m)", width: w.width - 415, align: "right" },
      ],
      c.sol.slices.map((sl, i) => {
        const b = c.sol.boundaries[i + 1];
        return [
          String(i + 1),
          `${sl.xLeft.toFixed(2)}–${sl.xRight.toFixed(2)}`,
          sl.alpha.toFixed(1),
          sl.normal.toFixed(1),
          sl.mAlpha.toFixed(3),
          b ? b.normal.toFixed(1) : "—",
          b ? b.shear.toFixed(1) : "—",
          b && b.thrustY !== null ? b.thrustY.toFixed(2) : "—",
        ];
      }),
      7,
    );
  }
}
