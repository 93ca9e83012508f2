import type { Metadata } from "next";
import { Suspense } from "react";
import { redirect, unstable_rethrow } from "next/navigation";
import { getSessionUser } from "@/lib/auth/session";
import { safeCallbackPath } from "@/lib/auth/callback-path";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Wordmark } from "@/components/shell/wordmark";

export const metadata: Metadata = { title: "Sign in" };

type Search = Promise<{ callbackUrl?: string | string[] }>;

export default async function SignInPage({ searchParams }: { searchParams: Search }) {
  // With the database out of reach the form still shows; signing in then says so in plain words.
  const user = await getSessionUser().catch((err: unknown) => {
    unstable_rethrow(err); // Next's own signals (dynamic rendering, redirects) are not failures
    console.error("[sign-in] could not check the session", err);
    return null;
  });
  const { callbackUrl } = await searchParams;
  if (user) redirect(safeCallbackPath(typeof callbackUrl === "string" ? callbackUrl : null) ?? "/projects");
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex flex-col items-center gap-2 text-center">
          <Wordmark />
          <p className="text-sm text-ink-soft">Stability checks of embankment dams and soil slopes.</p>
        </div>
        <div className="panel p-6 shadow-sm">
          <Suspense>
            <SignInForm />
          </Suspense>
        </div>
        <p className="mt-4 text-center text-xs text-ink-faint">
          Accounts are created by your team&apos;s administrator.
        </p>
      </div>
    </main>
  );
}
