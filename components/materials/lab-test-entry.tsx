"use client";

import { useState } from "react";
import type { CsvProblem } from "@/lib/section-io";
import { LAB_KIND_INFO, LAB_TEST_KINDS, type LabTestKind } from "@/lib/materials/lab-kinds";
import {
  DEFAULT_LAB_OPTIONS,
  buildLabInput,
  emptyLabRow,
  type LabOptions,
  type LabRow,
} from "@/lib/materials/lab-rows";
import { checkAndDeriveLabTest, type LabDeriveOutcome } from "@/lib/materials/lab-derive";
import { labCsvTemplate, parseLabCsv } from "@/lib/materials/lab-csv";
import { fieldsToProblems, type TableProblem } from "@/lib/materials/problem-keys";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { LabOptionsFields } from "./lab-options-fields";
import { LabRowsTable } from "./lab-rows-table";
import { LabResultSummary } from "./lab-result-summary";
import { LabResultPlot } from "./lab-result-plot";
import { CsvDownloadLink, CsvDropZone } from "./csv-drop-zone";
import { CsvProblemList } from "./csv-problem-list";

export interface LabTestEntryProps {
  projectId: number;
  materialId: number;
  onSaved: () => void;
}

const freshRows = (kind: LabTestKind) => Array.from({ length: LAB_KIND_INFO[kind].startRows }, () => emptyLabRow(kind));

/**
 * Entry of a new set of test results: pick the kind, type or drop the rows, work the result out
 * here to see the fit, then save it (the server checks and derives again before storing).
 */
export function LabTestEntry({ projectId, materialId, onSaved }: LabTestEntryProps) {
  const [kind, setKind] = useState<LabTestKind>("direct-shear");
  const [name, setName] = useState("");
  const [rows, setRows] = useState<LabRow[]>(() => freshRows("direct-shear"));
  const [options, setOptions] = useState<LabOptions>(DEFAULT_LAB_OPTIONS);
  const [problems, setProblems] = useState<TableProblem[]>([]);
  const [csvProblems, setCsvProblems] = useState<CsvProblem[]>([]);
  const [preview, setPreview] = useState<Extract<LabDeriveOutcome, { ok: true }> | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [banner, setBanner] = useState<{ kind: "error" | "ok"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  function reset(next: LabTestKind) {
    setKind(next);
    setRows(freshRows(next));
    setProblems([]);
    setCsvProblems([]);
    setPreview(null);
    setBanner(null);
  }

  /** Checks and derives in the browser; returns the input when it is clean. */
  function workOut(): Record<string, unknown> | null {
    setBanner(null);
    const built = buildLabInput(kind, rows, options);
    if (!built.ok) {
      setProblems(built.problems);
      setPreview(null);
      return null;
    }
    const outcome = checkAndDeriveLabTest(kind, built.data);
    setProblems(outcome.ok ? [] : outcome.problems);
    setPreview(outcome.ok ? outcome : null);
    return outcome.ok ? built.data : null;
  }

  async function save() {
    const data = workOut();
    if (!data) return;
    setBusy(true);
    setFields({});
    try {
      await fetchJson(`/api/projects/${projectId}/lab-tests`, {
        method: "POST",
        json: { materialId, kind, name, data },
      });
      setBanner({ kind: "ok", text: "Saved. The set is listed above, with buttons to use its values." });
      setName("");
      setRows(freshRows(kind));
      setPreview(null);
      onSaved();
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setProblems(fieldsToProblems(err.fields).filter((p) => p.column !== "name"));
        setBanner({ kind: "error", text: err.message });
      } else setBanner({ kind: "error", text: "Could not reach the server." });
    } finally {
      setBusy(false);
    }
  }

  function readCsv(text: string) {
    const parsed = parseLabCsv(kind, text);
    setCsvProblems(parsed.ok ? [] : parsed.problems);
    if (parsed.ok) {
      setRows(parsed.rows.length ? parsed.rows : freshRows(kind));
      setPreview(null);
      setProblems([]);
    }
  }

  const info = LAB_KIND_INFO[kind];
  return (
    <section className="panel space-y-4 p-4" aria-labelledby="lab-entry-heading" data-testid="lab-entry">
      <h2 id="lab-entry-heading" className="font-semibold">
        Add test results
      </h2>
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label className="label" htmlFor="lab-kind">
            Kind of test
          </label>
          <select id="lab-kind" className="field" value={kind} onChange={(e) => reset(e.target.value as LabTestKind)}>
            {LAB_TEST_KINDS.map((k) => (
              <option key={k} value={k}>
                {LAB_KIND_INFO[k].label}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="lab-name">
            Name of the set
          </label>
          <input
            id="lab-name"
            className="field"
            placeholder="e.g. Borehole 3, 4.5 m, shear box"
            value={name}
            onChange={(e) => setName(e.target.value)}
          />
          <FieldError messages={fields.name} />
        </div>
      </div>
      <LabOptionsFields kind={kind} options={options} onChange={setOptions} problems={problems} />
      <LabRowsTable kind={kind} options={options} rows={rows} onChange={setRows} problems={problems} />
      <details className="text-sm">
        <summary className="cursor-pointer text-ink-soft">Fill the table from a CSV file or pasted rows</summary>
        <div className="mt-2 space-y-2">
          <p className="text-xs text-ink-faint">
            Header: {info.columns.map((c) => `${c.key}${c.unit ? ` (${c.unit})` : ""}`).join(", ")}.
          </p>
          <CsvDropZone
            label="Drop a CSV of test results here, or click to choose one"
            onText={readCsv}
            onRejected={(m) => setCsvProblems([{ row: 1, column: null, message: m }])}
          />
          <textarea
            className="field min-h-20 font-mono text-xs"
            placeholder={labCsvTemplate(kind)}
            aria-label="Paste rows of a CSV, header first"
            onPaste={(e) => {
              const text = e.clipboardData.getData("text");
              e.preventDefault();
              readCsv(text);
            }}
          />
          <CsvDownloadLink text={labCsvTemplate(kind)} fileName={`${kind}-template.csv`}>
            Download a template
          </CsvDownloadLink>
          <CsvProblemList items={csvProblems} kind="problem" />
        </div>
      </details>
      {problems.length > 0 ? (
        <ul
          className="rounded-md border border-alarm-600 bg-alarm-50 px-3 py-2 text-sm text-alarm-700"
          data-testid="lab-problems"
        >
          {problems.map((p, i) => (
            <li key={i}>{p.message}</li>
          ))}
        </ul>
      ) : null}
      {preview ? (
        <div className="grid gap-4 border-t border-rule pt-4 lg:grid-cols-2">
          <LabResultSummary record={preview.record} />
          <LabResultPlot record={preview.record} />
        </div>
      ) : null}
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
      <div className="flex gap-2">
        <button type="button" className="btn-quiet" onClick={() => workOut()}>
          Work out the result
        </button>
        <button type="button" className="btn-primary" disabled={busy} onClick={save}>
          {busy ? "Saving…" : "Save the test set"}
        </button>
      </div>
    </section>
  );
}
