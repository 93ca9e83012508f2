import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { noticePrefsSchema } from "@/lib/review/validations";
import { fetchNoticePreferences, saveNoticePreferences } from "@/db/queries/notifications";

/** The signed-in person's choice of e-mail notices: {preferences: {"run-submitted": true, …}}. */
export const GET = apiRoute(async () => {
  const user = await requireUser();
  return NextResponse.json({ preferences: await fetchNoticePreferences(user.id) });
});

/** Saves choices: {preferences: [{kind, enabled}]}. */
export const PUT = apiRoute(async (request: Request) => {
  const user = await requireUser();
  const input = await parseJson(request, noticePrefsSchema);
  await saveNoticePreferences(user.id, input.preferences);
  return NextResponse.json({ preferences: await fetchNoticePreferences(user.id) });
});
