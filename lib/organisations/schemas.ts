import { z } from "zod";
import { ROLES } from "@/db/schema";

export const REVIEW_PERIODS = [1, 3, 6, 12, 24] as const;

/** When review reminders go, in days before the review date (Heftwise policy presets). */
export const REVIEW_REMINDER_PRESETS = {
  "30,7": "30 and 7 days before",
  "60,30,7": "60, 30 and 7 days before",
  "14,3": "14 and 3 days before",
  "7": "7 days before",
} as const;

export const organisationSettingsSchema = z.object({
  name: z.string().trim().min(2, "Enter the organisation's name").max(120, "Use at most 120 characters"),
  reviewPeriodMonths: z.coerce
    .number({ error: "Choose a review period" })
    .int()
    .refine((n) => (REVIEW_PERIODS as readonly number[]).includes(n), "Choose one of the listed periods"),
  secondFactorRoles: z.array(z.enum(ROLES, { error: "Unknown role" })).max(ROLES.length),
  reviewReminders: z.enum(Object.keys(REVIEW_REMINDER_PRESETS) as [keyof typeof REVIEW_REMINDER_PRESETS], {
    error: "Choose when reminders go",
  }),
  approvalReminderDays: z.coerce
    .number({ error: "Enter a number of days" })
    .int("Enter whole days")
    .min(1, "At least 1 day")
    .max(30, "At most 30 days"),
});

export type OrganisationSettingsInput = z.input<typeof organisationSettingsSchema>;

export const LOGO_MAX_BYTES = 300_000;
export const LOGO_TYPES = ["image/png", "image/jpeg"] as const;

/** `npm run org:create`: the organisation and its first administrator. */
export const organisationCliSchema = z.object({
  organisation: z
    .string({ error: "Give the organisation's name" })
    .trim()
    .min(2, "Give the organisation's name")
    .max(120),
  name: z.string({ error: "Give the administrator's name" }).trim().min(2, "Give the administrator's name").max(120),
  email: z
    .string({ error: "Give the administrator's e-mail address" })
    .trim()
    .toLowerCase()
    .pipe(z.email("Give a valid e-mail address")),
});
