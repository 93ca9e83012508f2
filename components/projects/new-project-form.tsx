"use client";

import { useState } from "react";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";

export function NewProjectForm({ onDone, onCancel }: { onDone: () => void; onCancel: () => void }) {
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [error, setError] = useState<string | null>(null);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    try {
      await fetchJson("/api/projects", {
        method: "POST",
        json: { name: form.get("name"), description: form.get("description") },
      });
      onDone();
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setError(err.message);
      } else setError("Could not reach the server.");
    }
  }

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
      {error ? <FormBanner kind="error">{error}</FormBanner> : null}
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
