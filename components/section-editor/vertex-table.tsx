"use client";

import type { Point, SectionDocument } from "@/lib/stability";
import { ownerOf, ownerPoints, vertexRef, type Owner, type Selection, type VertexRef } from "@/lib/editor/refs";
import { CoordinateInput } from "./coordinate-input";

interface VertexTableProps {
  doc: SectionDocument;
  selection: Selection | null;
  readOnly: boolean;
  onSelectVertex(sel: Selection): void;
  onMove(ref: VertexRef, p: Point): void;
  onInsertAfter(owner: Owner, index: number): void;
  onDelete(owner: Owner, index: number): void;
}

/** Exact coordinates of the selected region or phreatic line, one row per vertex. */
export function VertexTable({
  doc,
  selection,
  readOnly,
  onSelectVertex,
  onMove,
  onInsertAfter,
  onDelete,
}: VertexTableProps) {
  const owner = selection ? ownerOf(selection) : null;
  const points = owner ? ownerPoints(doc, owner) : undefined;
  const title = owner?.kind === "region" ? `Region ${owner.region + 1} vertices` : "Phreatic line points";
  return (
    <section className="panel p-3" data-testid="vertex-table" aria-label="Vertex coordinates">
      <h3 className="label">{owner && points ? title : "Coordinates"}</h3>
      {!owner || !points ? (
        <p className="text-xs text-ink-faint">Select a region or the phreatic line to type its coordinates.</p>
      ) : (
        <div className="max-h-72 overflow-y-auto">
          <table className="w-full border-separate border-spacing-y-0.5 text-xs">
            <thead className="text-left text-ink-faint">
              <tr>
                <th className="w-6 font-normal">#</th>
                <th className="font-normal">x (m)</th>
                <th className="font-normal">elevation (m)</th>
                <th className="w-14" aria-label="Row actions" />
              </tr>
            </thead>
            <tbody>
              {points.map((p, i) => {
                const ref = vertexRef(owner, i);
                const active = selection?.vertex === i;
                const select = () => selection && onSelectVertex({ ...selection, vertex: i });
                return (
                  <tr
                    key={i}
                    data-testid={`vertex-row-${i}`}
                    aria-selected={active}
                    className={active ? "bg-clay-50" : undefined}
                    onClick={select}
                  >
                    <td className={`pl-1 font-mono ${active ? "text-clay-700" : "text-ink-faint"}`}>{i + 1}</td>
                    <td>
                      <CoordinateInput
                        value={p[0]}
                        label={`x of vertex ${i + 1}`}
                        testId={`vertex-x-${i}`}
                        readOnly={readOnly}
                        onFocus={select}
                        onCommit={(x) => onMove(ref, [x, p[1]])}
                      />
                    </td>
                    <td>
                      <CoordinateInput
                        value={p[1]}
                        label={`elevation of vertex ${i + 1}`}
                        testId={`vertex-y-${i}`}
                        readOnly={readOnly}
                        onFocus={select}
                        onCommit={(y) => onMove(ref, [p[0], y])}
                      />
                    </td>
                    <td className="whitespace-nowrap text-right">
                      {!readOnly && (
                        <>
                          <button
                            type="button"
                            className="rounded px-1 text-ink-soft hover:bg-paper-sunk"
                            aria-label={`Add a vertex after vertex ${i + 1}`}
                            title="Add a vertex after this one"
                            onClick={() => onInsertAfter(owner, i)}
                          >
                            +
                          </button>
                          <button
                            type="button"
                            className="rounded px-1 text-alarm-700 hover:bg-alarm-50"
                            aria-label={`Delete vertex ${i + 1}`}
                            title="Delete this vertex"
                            onClick={() => onDelete(owner, i)}
                          >
                            ×
                          </button>
                        </>
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
