import { z } from "zod";
import { ROLES } from "@/db/schema";

export const roleSchema = z.enum(ROLES, { error: "Choose a role" });

export const inviteSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email("Enter a valid e-mail address")),
  name: z.string().trim().min(2, "Enter the person's name").max(120, "Use at most 120 characters"),
  role: roleSchema,
});

export const changeRoleSchema = z.object({ userId: z.uuid("Unknown user"), role: roleSchema });
export const setActiveSchema = z.object({ userId: z.uuid("Unknown user"), active: z.boolean() });
export const resendInviteSchema = z.object({ userId: z.uuid("Unknown user") });

export type InviteInput = z.infer<typeof inviteSchema>;

export const ROLE_LABELS: Record<(typeof ROLES)[number], string> = {
  admin: "Administrator",
  adviser: "Safety adviser",
  approver: "Approver",
  foreman: "Foreman",
};
