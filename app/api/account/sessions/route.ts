import { NextResponse } from "next/server";
import { apiRoute } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { bumpSessionVersion } from "@/db/queries/users";

/** Signs the caller out everywhere: every session of theirs, in any browser, this one included, ends now. */
export const DELETE = apiRoute(async () => {
  const user = await requireUser();
  await bumpSessionVersion(user.id);
  return NextResponse.json({ ok: true });
});
