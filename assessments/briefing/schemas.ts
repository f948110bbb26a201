import { z } from "zod";
import { drawnSignatureSchema } from "@/lib/drawn-signature";

const signature = drawnSignatureSchema("Sign in the box");

/** A key made on the phone, so that sending the same thing again after lost signal records it once. */
const deviceKey = (message: string) => z.string().regex(/^[A-Za-z0-9-]{16,64}$/, message);

/**
 * A time read from the phone's clock. A phone without signal sends its record later, so the time can be
 * in the past, but not by more than 30 days, nor ahead of the server by more than 5 minutes
 * (Heftwise policy: a clock that far out is wrong, and the record would mislead).
 */
export const DEVICE_CLOCK_TOLERANCE_MS = 5 * 60_000;
export const OFFLINE_RECORD_MAX_AGE_DAYS = 30;
const deviceTime = z.iso.datetime({ offset: true, error: "Invalid time" }).refine(
  (value) => {
    const at = Date.parse(value);
    const now = Date.now();
    return at <= now + DEVICE_CLOCK_TOLERANCE_MS && at >= now - OFFLINE_RECORD_MAX_AGE_DAYS * 86_400_000;
  },
  { error: "The phone's clock is wrong, or the record is older than 30 days: check the date and time on the phone" },
);

/** A record that reached the server more than five minutes after it was taken: it waited on a phone. */
export const sentLater = (takenAt: Date, receivedAt: Date) =>
  receivedAt.getTime() - takenAt.getTime() > DEVICE_CLOCK_TOLERANCE_MS;

/**
 * Starting a briefing. A phone sends its own key and the time it started, so a briefing taken without
 * signal is recorded once, at the time it happened, when the signal returns.
 */
export const startBriefingSchema = z.object({
  revisionId: z.uuid("Choose an approved assessment"),
  place: z.string().trim().min(2, "Say where the briefing is held").max(200),
  key: deviceKey("Invalid briefing key").optional(),
  startedAt: deviceTime.optional(),
});

/** One operative's sign-on. The key is made on the device, so a retry after lost signal adds no duplicate. */
export const attendeeSchema = z.object({
  key: deviceKey("Invalid sign-on key"),
  name: z.string().trim().min(2, "Enter your name").max(120),
  employer: z.string().trim().min(2, "Enter your employer").max(120),
  cardNumber: z.string().trim().min(3, "Enter your competence card number").max(40),
  signature,
  signedAt: deviceTime,
});

/** The foreman's sign-off; with the phone's key and time when it was signed without signal. */
export const completeBriefingSchema = z.object({
  signature,
  key: deviceKey("Invalid sign-off key").optional(),
  signedAt: deviceTime.optional(),
});

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
