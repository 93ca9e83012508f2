"use client";

import { useRouter } from "next/navigation";
import { fetchJson } from "@/lib/client/fetch-json";
import { useApiForm } from "@/components/ui/use-api-form";

/** Sends one change to a run's API and refreshes the server-rendered page when it succeeds. */
export function useRunAction() {
  const router = useRouter();
  const { run: submit, busy, notice, fields } = useApiForm();

  function run(url: string, init: RequestInit & { json?: unknown }): Promise<boolean> {
    return submit(async () => {
      await fetchJson(url, init);
      router.refresh();
    });
  }

  const error = notice?.kind === "error" ? { message: notice.text, fields } : null;
  return { run, busy, error };
}
