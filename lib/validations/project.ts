import { z } from "zod";
import { PROJECT_ROLES } from "@/lib/permissions";

export const createProjectSchema = z.object({
  name: z.string().trim().min(3, "At least 3 characters.").max(200, "At most 200 characters."),
  description: z.string().trim().max(4000, "At most 4000 characters.").default(""),
});

export const memberSchema = z.object({
  userId: z.number({ error: "Choose a user." }).int().positive(),
  role: z.enum(PROJECT_ROLES, { error: "Choose engineer, reviewer or designer." }),
});
