"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";

/** Archives a section (its runs and versions stay) or brings it back to the working list. */
export function ArchiveSectionButton({
  projectId,
  sectionId,
  name,
  archived,
}: {
  projectId: number;
  sectionId: number;
  name: string;
  archived: boolean;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function toggle() {
    setBusy(true);
    setError(null);
    try {
      await fetchJson(`/api/projects/${projectId}/sections/${sectionId}/archive`, {
        method: "POST",
        json: { archived: !archived },
      });
      router.refresh();
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : "Could not reach the server.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <span className="inline-flex items-center gap-2">
      <button
        type="button"
        className="btn-quiet"
        disabled={busy}
        onClick={toggle}
        aria-label={`${archived ? "Restore" : "Archive"} ${name}`}
      >
        {archived ? "Restore" : "Archive"}
      </button>
      {error ? (
        <span role="alert" className="text-xs text-alarm-700">
          {error}
        </span>
      ) : null}
    </span>
  );
}
