"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button
      type="button"
      className="text-sm text-paper/80 hover:text-paper"
      onClick={() => signOut({ callbackUrl: "/sign-in" })}
    >
      Sign out
    </button>
  );
}
