"use client";

import Link from "next/link";
import type { RunDetail } from "@/lib/runs/types";
import type { GridSearchSuccess, SectionDocument } from "@/lib/stability";
import { diffDocuments } from "@/lib/sections/diff";
import { waterUsedText } from "@/lib/runs/view/water-used";
import { conditionWords, faceWords } from "@/lib/vocabulary";
import { materialPalette } from "@/lib/sections/material-palette";
import { OVERLAY_COLOURS } from "@/lib/runs/view/circle-styles";
import { RunCanvas } from "@/components/runs/result/run-canvas";
import { CompareTable } from "@/components/runs/result/compare-table";
import { InputDiff } from "@/components/runs/result/input-diff";

const letter = (i: number) => String.fromCharCode(65 + i);

/** Two to four runs on one screen: FS side by side, circles overlaid, and what differs in their inputs. */
export function RunComparison({ runs }: { runs: RunDetail[] }) {
  const base = runs[0];
  const baseDoc = base.document as SectionDocument;
  const overlays = runs.flatMap((run, i) => {
    const result = run.result as GridSearchSuccess;
    const method = result.results.bishop ? "bishop" : "fellenius";
    const c = result.results[method];
    return c
      ? [
          {
            label: `${letter(i)} ${method === "bishop" ? "Bishop" : "ordinary"} ${c.fs.toFixed(3)}`,
            color: OVERLAY_COLOURS[i % OVERLAY_COLOURS.length],
            circle: c.circle,
            entry: c.entry,
            exit: c.exit,
          },
        ]
      : [];
  });
  const sameGeometry = runs.every(
    (r) => JSON.stringify((r.document as SectionDocument).regions) === JSON.stringify(baseDoc.regions),
  );

  return (
    <div className="space-y-4">
      <CompareTable
        runs={runs.map((r, i) => ({
          id: r.id,
          label: `${letter(i)}: ${r.title}`,
          detail: `${r.sectionName} v${r.sectionVersion} · ${conditionWords(r.loadingCondition)} · ${faceWords(r.face, true)}`,
          water: waterUsedText(r),
          requiredFs: r.requiredFs,
          fs: { bishop: r.fsBishop, fellenius: r.fsFellenius },
          colour: OVERLAY_COLOURS[i % OVERLAY_COLOURS.length],
        }))}
      />
      <div>
        <RunCanvas
          document={baseDoc}
          materialColors={Object.fromEntries(materialPalette(baseDoc.materials).map((m) => [m.key, m.color]))}
          overlays={overlays}
          height={460}
          // The table above already carries the page's caution; once per page is enough.
          caution={false}
        />
        {!sameGeometry ? (
          <p className="mt-1 text-xs text-ink-soft">
            The runs analyse different geometry; the circles are drawn on the section of run A ({base.sectionName} v
            {base.sectionVersion}).
          </p>
        ) : null}
      </div>
      <section className="space-y-3" aria-label="Differences in the inputs">
        <h2 className="text-lg font-semibold">What differs in the inputs</h2>
        {runs.slice(1).map((run, i) => {
          const differences = diffDocuments(baseDoc, run.document as SectionDocument);
          const extra = [
            run.requiredFs !== base.requiredFs
              ? {
                  area: "analysis" as const,
                  path: "requiredFs",
                  text: `required FS ${base.requiredFs.toFixed(2)} → ${run.requiredFs.toFixed(2)}`,
                  what: "Required FS",
                  before: base.requiredFs.toFixed(2),
                  after: run.requiredFs.toFixed(2),
                }
              : null,
            waterUsedText(run) !== waterUsedText(base)
              ? {
                  area: "analysis" as const,
                  path: "waterCondition",
                  text: `water ${waterUsedText(base)} → ${waterUsedText(run)}`,
                  what: "Water",
                  before: waterUsedText(base),
                  after: waterUsedText(run),
                }
              : null,
            run.loadingCondition !== base.loadingCondition
              ? {
                  area: "analysis" as const,
                  path: "condition",
                  text: `loading condition ${conditionWords(base.loadingCondition)} → ${conditionWords(run.loadingCondition)}`,
                  what: "Loading condition",
                  before: conditionWords(base.loadingCondition),
                  after: conditionWords(run.loadingCondition),
                }
              : null,
          ].filter((d): d is NonNullable<typeof d> => d !== null);
          return (
            <div key={run.id} className="panel p-3" data-testid={`diff-${letter(i + 1)}`}>
              <h3 className="mb-2 text-sm font-semibold">
                <Link href={`/projects/${run.projectId}/runs/${base.id}`} className="hover:text-clay-600">
                  A
                </Link>{" "}
                →{" "}
                <Link href={`/projects/${run.projectId}/runs/${run.id}`} className="hover:text-clay-600">
                  {letter(i + 1)}
                </Link>
              </h3>
              <InputDiff
                differences={[...extra, ...differences]}
                beforeLabel={`A: ${base.title}`}
                afterLabel={`${letter(i + 1)}: ${run.title}`}
              />
            </div>
          );
        })}
      </section>
    </div>
  );
}
