/** Request bodies of the review routes; one schema each for the form and the server. */
import { z } from "zod";
import { CHECKLIST_KEYS, CHECK_STATES } from "./checklist";
import { NOTICE_KINDS } from "./notices";
import { TRANSITION_ACTIONS } from "./status";

export const transitionSchema = z.object({
  action: z.enum(TRANSITION_ACTIONS, { error: "Choose submit, approve or return." }),
  note: z.string().trim().max(4000, "At most 4,000 characters.").default(""),
  /** Signing off a run below its required FS: why the reviewer accepts it. */
  belowRequiredReason: z.string().trim().max(2000, "At most 2,000 characters.").default(""),
});

export const renameRunSchema = z.object({
  title: z.string().trim().min(3, "At least 3 characters.").max(200, "At most 200 characters."),
});

const finite = (what: string) =>
  z
    .number({ error: `${what} must be a number (m).` })
    .finite()
    .min(-1e6)
    .max(1e6);

export const commentSchema = z
  .object({
    body: z.string().trim().min(1, "Write the comment.").max(4000, "At most 4,000 characters."),
    pin: z
      .object({ x: finite("x"), y: finite("y") })
      .nullable()
      .default(null),
    slice: z
      .object({
        number: z
          .number({ error: "Enter the slice number." })
          .int("Whole slice numbers only.")
          .min(1, "Slices are numbered from 1."),
        method: z.enum(["bishop", "fellenius"]),
      })
      .nullable()
      .default(null),
  })
  .refine((c) => !(c.pin && c.slice), { message: "Pin a comment to a place or to a slice, not both.", path: ["pin"] });

export const checklistSchema = z.object({
  items: z
    .array(
      z.object({
        key: z.enum(CHECKLIST_KEYS, { error: "Unknown checklist item." }),
        state: z.enum(CHECK_STATES, { error: "Use open, ok or concern." }),
        note: z.string().trim().max(1000, "At most 1,000 characters.").default(""),
      }),
    )
    .min(1, "Send at least one item.")
    .max(CHECKLIST_KEYS.length),
});

export const noticePrefsSchema = z.object({
  preferences: z
    .array(z.object({ kind: z.enum(NOTICE_KINDS, { error: "Unknown notice." }), enabled: z.boolean() }))
    .min(1)
    .max(NOTICE_KINDS.length),
});

export type CommentInput = z.infer<typeof commentSchema>;
export type ChecklistInput = z.infer<typeof checklistSchema>;
