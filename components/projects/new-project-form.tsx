"use client";

import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

export function NewProjectForm({ onDone, onCancel }: { onDone: () => void; onCancel: () => void }) {
  const { onSubmit, fields, notice } = useApiForm(async (form) => {
    await fetchJson("/api/projects", {
      method: "POST",
      json: { name: form.get("name"), description: form.get("description") },
    });
    onDone();
  });

  return (
    <form onSubmit={onSubmit} className="panel space-y-3 p-4" noValidate>
      <div>
        <label className="label" htmlFor="project-name">
          Name
        </label>
        <input id="project-name" name="name" className="field" />
        <FieldError messages={fields.name} />
      </div>
      <div>
        <label className="label" htmlFor="project-description">
          Description
        </label>
        <textarea id="project-description" name="description" rows={2} className="field" />
        <FieldError messages={fields.description} />
      </div>
      {notice ? <FormBanner kind={notice.kind}>{notice.text}</FormBanner> : null}
      <div className="flex gap-2">
        <button type="submit" className="btn-primary">
          Create project
        </button>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
