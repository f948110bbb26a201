import { z } from "zod";
import { drawnSignatureSchema } from "@/lib/drawn-signature";

const signature = drawnSignatureSchema("Sign in the box");

export const startBriefingSchema = z.object({
  revisionId: z.uuid("Choose an approved assessment"),
  place: z.string().trim().min(2, "Say where the briefing is held").max(200),
});

/** One operative's sign-on. The key is made on the device, so a retry after lost signal adds no duplicate. */
export const attendeeSchema = z.object({
  key: z.string().regex(/^[A-Za-z0-9-]{16,64}$/, "Invalid sign-on key"),
  name: z.string().trim().min(2, "Enter your name").max(120),
  employer: z.string().trim().min(2, "Enter your employer").max(120),
  cardNumber: z.string().trim().min(3, "Enter your competence card number").max(40),
  signature,
  signedAt: z.iso.datetime({ offset: true, error: "Invalid time" }),
});

export const completeBriefingSchema = z.object({ signature });

export const siteChangeSchema = z.object({
  revisionId: z.uuid(),
  text: z.string().trim().min(10, "Describe what is different (at least 10 characters)").max(2000),
});

/** The adviser's decision that a site change needs no new revision, with the reason. */
export const siteChangeDecisionSchema = z.object({
  note: z
    .string()
    .trim()
    .min(10, "Say why the assessment still holds (at least 10 characters)")
    .max(2000, "Use at most 2000 characters"),
});

export type AttendeeInput = z.infer<typeof attendeeSchema>;
export type SiteChangeDecisionInput = z.infer<typeof siteChangeDecisionSchema>;

/** The foremen assigned to a job (replaces the list). */
export const assignmentSchema = z.object({ foremanIds: z.array(z.uuid()).max(50) });
