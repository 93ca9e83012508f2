"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";

/** Sends one change to a run's API and refreshes the server-rendered page when it succeeds. */
export function useRunAction() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; fields: Record<string, string[]> } | null>(null);

  async function run(url: string, init: RequestInit & { json?: unknown }): Promise<boolean> {
    setBusy(true);
    setError(null);
    try {
      await fetchJson(url, init);
      router.refresh();
      return true;
    } catch (err) {
      setError(
        err instanceof ApiClientError
          ? { message: err.message, fields: err.fields }
          : { message: "Could not reach the server.", fields: {} },
      );
      return false;
    } finally {
      setBusy(false);
    }
  }

  return { run, busy, error };
}
