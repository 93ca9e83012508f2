"use client";

import { useMemo, useState } from "react";
import type { LibraryMaterial } from "@/lib/materials/types";
import { MATERIAL_COLUMNS, csvTemplates } from "@/lib/section-io";
import { checkMaterialsImport } from "@/lib/materials/import-check";
import { fieldsToProblems } from "@/lib/materials/problem-keys";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FormBanner } from "@/components/ui/form-message";
import { CsvDownloadLink, CsvDropZone } from "./csv-drop-zone";
import { CsvProblemList } from "./csv-problem-list";
import { countOf } from "@/lib/format";

export interface MaterialsCsvImportProps {
  projectId: number;
  existingKeys: string[];
  onImported: (materials: LibraryMaterial[]) => void;
}

/**
 * Import of a materials CSV: the file is read and checked here first, shown as a preview with
 * every problem by row and column, and sent only when clean. The server checks it again.
 */
export function MaterialsCsvImport({ projectId, existingKeys, onImported }: MaterialsCsvImportProps) {
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [banner, setBanner] = useState<{ kind: "error" | "ok"; text: string } | null>(null);
  const [serverProblems, setServerProblems] = useState<{ row: number; column: string | null; message: string }[]>([]);
  const [busy, setBusy] = useState(false);
  const check = useMemo(() => (file ? checkMaterialsImport(file.text, existingKeys) : null), [file, existingKeys]);
  const badCells = new Set((check?.problems ?? []).map((p) => `${p.row}:${p.column ?? ""}`));

  async function send() {
    if (!file || !check?.ok) return;
    setBusy(true);
    setBanner(null);
    try {
      const result = await fetchJson<{ materials: LibraryMaterial[] }>(`/api/projects/${projectId}/materials/import`, {
        method: "POST",
        json: { csv: file.text },
      });
      onImported(result.materials);
      setBanner({
        kind: "ok",
        text: `Added ${countOf(result.materials.length, "material")} from ${file.name}.`,
      });
      setFile(null);
    } catch (err) {
      if (err instanceof ApiClientError) {
        setServerProblems(
          fieldsToProblems(err.fields).map((p) => ({ row: p.row ?? 1, column: p.column, message: p.message })),
        );
        setBanner({ kind: "error", text: err.message });
      } else setBanner({ kind: "error", text: "Could not reach the server." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <section className="panel space-y-3 p-4" aria-labelledby="import-heading" data-testid="materials-import">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="import-heading" className="font-semibold">
          Import from a CSV file
        </h2>
        <CsvDownloadLink text={csvTemplates.materials} fileName="materials-template.csv">
          Download a template
        </CsvDownloadLink>
      </div>
      <p className="text-xs text-ink-faint">
        {/* The column names are the file's own spelling, so they are shown as code. */}
        Columns: <code className="font-mono">{MATERIAL_COLUMNS.join(", ")}</code>. Units: γ and γsat in kN/m³, c and su
        in kPa, φ in degrees, <code className="font-mono">suGradient</code> in kPa/m,{" "}
        <code className="font-mono">suDatum</code> in m.
      </p>
      <CsvDropZone
        label="Drop a materials CSV here, or click to choose one"
        testId="materials-drop"
        onText={(text, name) => {
          setFile({ text, name });
          setServerProblems([]);
          setBanner(null);
        }}
        onRejected={(message) => setBanner({ kind: "error", text: message })}
      />
      {check && file ? (
        <>
          <p className="text-sm text-ink-soft">
            {file.name}: {countOf(check.preview.length, "row")} read.
          </p>
          {check.preview.length > 0 ? (
            <div className="max-h-72 overflow-auto rounded border border-rule">
              <table className="w-full text-xs" data-testid="import-preview">
                <thead className="sticky top-0 bg-paper-sunk text-left">
                  <tr>
                    <th className="px-2 py-1">Row</th>
                    {MATERIAL_COLUMNS.map((c) => (
                      <th key={c} className="px-2 py-1 font-mono">
                        {c}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {check.preview.map((r) => (
                    <tr
                      key={r.row}
                      className={`border-t border-rule ${badCells.has(`${r.row}:`) ? "bg-alarm-50" : ""}`}
                    >
                      <td className="px-2 py-1 text-ink-faint">{r.row}</td>
                      {MATERIAL_COLUMNS.map((c) => (
                        <td
                          key={c}
                          className={`px-2 py-1 ${badCells.has(`${r.row}:${c}`) ? "bg-alarm-50 font-medium text-alarm-700" : ""}`}
                        >
                          {r.cells[c] ?? ""}
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          <CsvProblemList items={[...check.problems, ...serverProblems]} kind="problem" />
          <CsvProblemList items={check.warnings} kind="warning" />
          <div className="flex gap-2">
            <button
              type="button"
              className="btn-primary"
              disabled={!check.ok || check.materials.length === 0 || busy}
              onClick={send}
            >
              {busy
                ? "Adding…"
                : `Add ${check.materials.length === 1 ? "this material" : `these ${countOf(check.materials.length, "material")}`}`}
            </button>
            <button type="button" className="btn-quiet" onClick={() => setFile(null)}>
              Discard the file
            </button>
          </div>
        </>
      ) : null}
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
    </section>
  );
}
