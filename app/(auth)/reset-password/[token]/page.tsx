import type { Metadata } from "next";
import Link from "next/link";
import { hashResetToken } from "@/lib/auth/password-reset";
import { resetLinkRefusal } from "@/lib/users/reset-link";
import { readResetToken } from "@/db/queries/password-resets";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { FormBanner } from "@/components/ui/form-message";
import { Wordmark } from "@/components/shell/wordmark";

export const metadata: Metadata = { title: "Set a new password", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

/** Opened from a mailed reset link: the form while the link is good, otherwise why it no longer works. */
export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const state = await readResetToken(hashResetToken(token));
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex flex-col items-center gap-2 text-center">
          <Wordmark />
          <h1 className="text-lg font-semibold">Set a new password</h1>
        </div>
        <div className="panel p-6 shadow-sm">
          {state.kind === "valid" ? (
            <ResetPasswordForm token={token} expiresAt={state.expiresAt} />
          ) : (
            <div className="space-y-4" data-testid="reset-refused">
              <FormBanner kind="error">{resetLinkRefusal(state)}</FormBanner>
              <Link href="/sign-in" className="btn-quiet">
                Go to sign-in
              </Link>
            </div>
          )}
        </div>
      </div>
    </main>
  );
}
