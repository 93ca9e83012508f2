"use client";

import { signOut } from "next-auth/react";
import { fetchJson } from "@/lib/client/fetch-json";
import { FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

/** Ends every session of the person, in every browser, then this one's cookie too. */
export function SignOutEverywhere() {
  const { run, notice, busy } = useApiForm();
  const endAll = () =>
    run(async () => {
      await fetchJson("/api/account/sessions", { method: "DELETE" });
      await signOut({ callbackUrl: "/sign-in" });
    });
  return (
    <section className="panel space-y-3 p-4" aria-labelledby="sessions-title">
      <h2 id="sessions-title" className="font-semibold">
        Sessions
      </h2>
      <p className="text-sm text-ink-soft">
        Left signed in on another computer, or lost a device? This ends your sessions in every browser, this one
        included.
      </p>
      {notice ? <FormBanner kind={notice.kind}>{notice.text}</FormBanner> : null}
      <button type="button" className="btn-danger" disabled={busy} onClick={endAll}>
        Sign out everywhere
      </button>
    </section>
  );
}
