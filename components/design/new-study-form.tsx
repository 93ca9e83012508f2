"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";

/** Names a new study; it starts from the demo embankment's dimensions with the project's materials. */
export function NewStudyForm({ projectId }: { projectId: number }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFields({});
    setError(null);
    setBusy(true);
    try {
      const r = await fetchJson<{ study: { id: number } }>(`/api/projects/${projectId}/design`, {
        method: "POST",
        json: { name },
      });
      router.push(`/projects/${projectId}/design/${r.study.id}`);
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setError(err.message);
      } else setError("Could not reach the server.");
      setBusy(false);
    }
  }

  return (
    <form onSubmit={onSubmit} className="panel flex flex-wrap items-end gap-3 p-4" noValidate>
      <div className="min-w-64 flex-1">
        <label className="label" htmlFor="study-name">
          New study name
        </label>
        <input
          id="study-name"
          className="field"
          value={name}
          onChange={(e) => setName(e.target.value)}
          placeholder="e.g. Main embankment, slope options"
        />
        <FieldError messages={fields.name} />
      </div>
      <button type="submit" className="btn-primary" disabled={busy}>
        Start study
      </button>
      {error && !fields.name ? (
        <div className="w-full">
          <FormBanner kind="error">{error}</FormBanner>
        </div>
      ) : null}
    </form>
  );
}
