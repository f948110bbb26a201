import { z } from "zod";
import { ROLES } from "@/db/schema";

export const TOKEN_LIFETIMES_DAYS = [7, 30, 90, 365] as const;

export const createTokenSchema = z.object({
  name: z.string().trim().min(2, "Name the integration this token is for").max(80, "Use at most 80 characters"),
  scope: z.enum(ROLES, { error: "Choose what the token may do" }),
  days: z.coerce
    .number({ error: "Choose how long it works" })
    .int()
    .refine((n) => (TOKEN_LIFETIMES_DAYS as readonly number[]).includes(n), "Choose one of the listed lifetimes"),
});
export const revokeTokenSchema = z.object({ tokenId: z.uuid("Unknown token") });

export type CreateTokenInput = z.input<typeof createTokenSchema>;
