"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

/** Names a new study; it starts from the demo embankment's dimensions with the project's materials. */
export function NewStudyForm({ projectId }: { projectId: number }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const { onSubmit, fields, notice, busy } = useApiForm(async () => {
    const r = await fetchJson<{ study: { id: number } }>(`/api/projects/${projectId}/design`, {
      method: "POST",
      json: { name },
    });
    router.push(`/projects/${projectId}/design/${r.study.id}`);
  });

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
      {notice && !fields.name ? (
        <div className="w-full">
          <FormBanner kind={notice.kind}>{notice.text}</FormBanner>
        </div>
      ) : null}
    </form>
  );
}
