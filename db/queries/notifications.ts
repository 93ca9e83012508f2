import type { Knex } from "knex";
import { getDb } from "../index";
import { NOTICE_KINDS, type NoticeKind } from "../../lib/review/notices";

export type NoticePreferences = Record<NoticeKind, boolean>;

export interface NoticeRecipient {
  id: number;
  name: string;
  email: string;
}

/** A person's choices; a notice without a saved choice is on. */
export async function fetchNoticePreferences(userId: number, db: Knex = getDb()): Promise<NoticePreferences> {
  const rows = await db("notification_preferences").where({ user_id: userId }).select("notice_kind", "enabled");
  const prefs = Object.fromEntries(NOTICE_KINDS.map((k) => [k, true])) as NoticePreferences;
  for (const r of rows)
    if ((NOTICE_KINDS as readonly string[]).includes(r.notice_kind))
      prefs[r.notice_kind as NoticeKind] = Boolean(r.enabled);
  return prefs;
}

export async function saveNoticePreferences(
  userId: number,
  prefs: readonly { kind: NoticeKind; enabled: boolean }[],
  db: Knex = getDb(),
): Promise<void> {
  await db.transaction(async (trx) => {
    for (const p of prefs) {
      await trx("notification_preferences")
        .insert({ user_id: userId, notice_kind: p.kind, enabled: p.enabled })
        .onConflict(["user_id", "notice_kind"])
        .merge(["enabled"]);
    }
  });
}

/** Active people who want this notice, among the given users or the project's members of a role. */
export async function fetchNoticeRecipients(
  kind: NoticeKind,
  who: { projectId: number; projectRole: "reviewer" } | { userIds: readonly number[] },
  db: Knex = getDb(),
): Promise<NoticeRecipient[]> {
  const q = db("users as u")
    .leftJoin("notification_preferences as p", function () {
      this.on("p.user_id", "u.id").andOn("p.notice_kind", db.raw("?", [kind]));
    })
    .where("u.active", true)
    .where((w) => w.whereNull("p.enabled").orWhere("p.enabled", true))
    .select("u.id", "u.name", "u.email")
    .orderBy("u.id");
  if ("userIds" in who) q.whereIn("u.id", [...who.userIds]);
  else
    q.join("project_members as m", "m.user_id", "u.id").where({
      "m.project_id": who.projectId,
      "m.role": who.projectRole,
    });
  return (await q) as NoticeRecipient[];
}
