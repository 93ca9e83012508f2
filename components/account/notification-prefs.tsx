"use client";

import { useState } from "react";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { NOTICE_INFO, NOTICE_KINDS, type NoticeKind } from "@/lib/review/notices";
import { FormBanner } from "@/components/ui/form-message";

/** Which review notices this person receives by e-mail; each change is saved at once. */
export function NotificationPrefs({ initial }: { initial: Record<NoticeKind, boolean> }) {
  const [prefs, setPrefs] = useState(initial);
  const [banner, setBanner] = useState<{ kind: "ok" | "error"; text: string } | null>(null);

  async function toggle(kind: NoticeKind, enabled: boolean) {
    const before = prefs;
    setPrefs({ ...prefs, [kind]: enabled });
    setBanner(null);
    try {
      const body = await fetchJson<{ preferences: Record<NoticeKind, boolean> }>("/api/account/notifications", {
        method: "PUT",
        json: { preferences: [{ kind, enabled }] },
      });
      setPrefs(body.preferences);
      setBanner({ kind: "ok", text: "Notice settings saved." });
    } catch (err) {
      setPrefs(before);
      setBanner({ kind: "error", text: err instanceof ApiClientError ? err.message : "Could not reach the server." });
    }
  }

  return (
    <section className="panel space-y-3 p-4" aria-labelledby="notices-heading" data-testid="notification-prefs">
      <h2 id="notices-heading" className="font-semibold">
        E-mail notices
      </h2>
      <ul className="space-y-2 text-sm">
        {NOTICE_KINDS.map((kind) => (
          <li key={kind}>
            <label className="flex items-start gap-2">
              <input
                type="checkbox"
                className="mt-0.5"
                checked={prefs[kind]}
                onChange={(e) => toggle(kind, e.target.checked)}
              />
              <span>
                {NOTICE_INFO[kind].label}
                <span className="block text-xs text-ink-faint">{NOTICE_INFO[kind].audience}</span>
              </span>
            </label>
          </li>
        ))}
      </ul>
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
    </section>
  );
}
