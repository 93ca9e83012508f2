import { z } from "zod";
import { ROLES } from "@/lib/permissions";

export const passwordRule = z
  .string()
  .min(10, "At least 10 characters.")
  .max(200, "At most 200 characters.")
  .refine((p) => /[A-Za-z]/.test(p) && /[0-9]/.test(p), "Use letters and at least one digit.");

export const createUserSchema = z.object({
  email: z.string().trim().toLowerCase().email("Enter an e-mail address.").max(254),
  name: z.string().trim().min(2, "At least 2 characters.").max(200),
  role: z.enum(ROLES, { error: "Choose a role." }),
  password: passwordRule,
});

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, "Enter your current password."),
    newPassword: passwordRule,
    confirmPassword: z.string(),
  })
  .refine((v) => v.newPassword === v.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two new passwords differ.",
  })
  .refine((v) => v.newPassword !== v.currentPassword, {
    path: ["newPassword"],
    message: "Choose a password you have not used here.",
  });

/** An administrator's change to a user: a role, the active flag, or lifting a sign-in lock. */
export const updateUserAccessSchema = z
  .object({
    role: z.enum(ROLES, { error: "Choose a role." }).optional(),
    active: z.boolean().optional(),
    unlockSignIn: z.literal(true).optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined || v.unlockSignIn, {
    path: ["_"],
    message: "Send a role, an active flag or unlockSignIn.",
  });

/** Setting a password from a mailed reset link: the same password rule as everywhere else. */
export const resetPasswordSchema = z
  .object({
    token: z.string().min(20, "The link is incomplete.").max(200, "The link is not valid."),
    newPassword: passwordRule,
    confirmPassword: z.string(),
  })
  .refine((v) => v.newPassword === v.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two new passwords differ.",
  });
