"use client";

import { useRef, useState } from "react";
import { signIn } from "next-auth/react";
import { useRouter, useSearchParams } from "next/navigation";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { safeCallbackPath } from "@/lib/auth/callback-path";

type Missing = { email?: string[]; password?: string[] };

/** What an empty form lacks, said before anything is sent. */
function missingFields(email: string, password: string): Missing {
  const missing: Missing = {};
  if (!email.trim()) missing.email = ["Enter your e-mail address."];
  if (!password) missing.password = ["Enter your password."];
  return missing;
}

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const [error, setError] = useState<string | null>(null);
  const [missing, setMissing] = useState<Missing>({});
  const [busy, setBusy] = useState(false);
  const emailRef = useRef<HTMLInputElement>(null);
  const passwordRef = useRef<HTMLInputElement>(null);
  const back = safeCallbackPath(params.get("callbackUrl"));

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const email = String(form.get("email") ?? "");
    const password = String(form.get("password") ?? "");
    const gaps = missingFields(email, password);
    setMissing(gaps);
    setError(null);
    if (gaps.email || gaps.password) {
      (gaps.email ? emailRef : passwordRef).current?.focus();
      return;
    }
    setBusy(true);
    const result = await signIn("credentials", { email, password, redirect: false, callbackUrl: back ?? "/projects" });
    setBusy(false);
    if (!result || result.error) {
      setError(
        result?.error && result.error !== "CredentialsSignin" ? result.error : "The e-mail or password is not right.",
      );
      return;
    }
    // `back` passed the same check as next-auth's redirect callback (lib/auth/options.ts).
    router.replace(back ?? "/projects");
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {back ? (
        <p className="text-sm text-ink-soft" data-testid="sign-in-return">
          Sign in to continue to the page you opened.
        </p>
      ) : null}
      <div>
        <label htmlFor="email" className="label">
          E-mail
        </label>
        <input
          ref={emailRef}
          id="email"
          name="email"
          type="email"
          autoComplete="username"
          required
          className="field"
          aria-invalid={missing.email ? true : undefined}
          aria-describedby={missing.email ? "email-error" : undefined}
        />
        <FieldError id="email-error" messages={missing.email} />
      </div>
      <div>
        <label htmlFor="password" className="label">
          Password
        </label>
        <input
          ref={passwordRef}
          id="password"
          name="password"
          type="password"
          autoComplete="current-password"
          required
          className="field"
          aria-invalid={missing.password ? true : undefined}
          aria-describedby={missing.password ? "password-error" : undefined}
        />
        <FieldError id="password-error" messages={missing.password} />
      </div>
      {error ? <FormBanner kind="error">{error}</FormBanner> : null}
      <button type="submit" className="btn-primary w-full" disabled={busy}>
        {busy ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
