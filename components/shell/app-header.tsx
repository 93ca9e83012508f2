import Link from "next/link";
import { Wordmark } from "./wordmark";
import { SignOutButton } from "./sign-out-button";
import { can, ROLE_LABELS } from "@/lib/permissions";
import type { SessionUser } from "@/lib/auth/session";
import type { WorkCounts } from "@/lib/review/work-queue";

/** A count beside a navigation link, read out with its meaning. */
function Count({ n, label }: { n: number; label: string }) {
  if (n === 0) return null;
  return (
    <span className="ml-1 rounded-full bg-clay-600 px-1.5 py-0.5 text-xs font-semibold text-white" title={label}>
      {n}
      <span className="sr-only"> {label}</span>
    </span>
  );
}

export function AppHeader({ user, counts }: { user: SessionUser; counts: WorkCounts }) {
  return (
    <header className="bg-ink text-paper">
      <div className="mx-auto flex max-w-7xl items-center gap-6 px-4 py-2.5">
        <Link href="/projects" aria-label="Scarpline home">
          <Wordmark inverted />
        </Link>
        <nav className="flex items-center gap-4 text-sm" aria-label="Main">
          <Link href="/projects" className="text-paper/80 hover:text-paper">
            Projects
          </Link>
          {counts.toReview > 0 ? (
            <Link href="/projects#review-queue" className="text-paper/80 hover:text-paper" data-testid="nav-to-review">
              To review
              <Count
                n={counts.toReview}
                label={counts.toReview === 1 ? "run awaits your review" : "runs await your review"}
              />
            </Link>
          ) : null}
          {counts.returned > 0 ? (
            <Link href="/projects#my-returned" className="text-paper/80 hover:text-paper" data-testid="nav-returned">
              Returned to you
              <Count n={counts.returned} label={counts.returned === 1 ? "run to revise" : "runs to revise"} />
            </Link>
          ) : null}
          {can(user.role, "users.manage") ? (
            <Link href="/admin/users" className="text-paper/80 hover:text-paper">
              People
            </Link>
          ) : null}
          {can(user.role, "mail.view") ? (
            <Link href="/admin/mail" className="text-paper/80 hover:text-paper">
              Mail log
            </Link>
          ) : null}
        </nav>
        <div className="ml-auto flex items-center gap-4">
          <Link href="/account" className="text-sm text-paper/90 hover:text-paper" data-testid="account-link">
            {user.name} <span className="ml-1 rounded bg-paper/15 px-1.5 py-0.5 text-xs">{ROLE_LABELS[user.role]}</span>
          </Link>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
