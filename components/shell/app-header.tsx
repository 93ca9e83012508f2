import Link from "next/link";
import { Wordmark } from "./wordmark";
import { SignOutButton } from "./sign-out-button";
import { can, ROLE_LABELS } from "@/lib/permissions";
import type { SessionUser } from "@/lib/auth/session";

export function AppHeader({ user }: { user: SessionUser }) {
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
