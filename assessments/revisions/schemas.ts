/** Inputs of the revision workflow: one schema each, shared by forms and the server. */
import { z } from "zod";
import { contentSchema, taskSchema } from "../method-statement/content";

export const createAssessmentSchema = z.object({
  jobId: z.uuid("Choose a job"),
  title: z.string().trim().min(3, "Give the assessment a title").max(200, "Use at most 200 characters"),
  templateId: z.string().max(60).optional(),
});

export const saveRevisionSchema = z.object({
  version: z.number().int().min(1),
  content: contentSchema,
});

/** Latest review date accepted, in years from today: Heftwise policy (DEVELOPERS.md, "Review dates"). */
export const REVIEW_WITHIN_YEARS = 3;

/** The range of review dates accepted on a given day (UTC), as YYYY-MM-DD: after today, up to the policy's limit. */
export function reviewDateRange(now = new Date()) {
  const today = now.toISOString().slice(0, 10);
  const latest = new Date(`${today}T00:00:00Z`);
  latest.setUTCFullYear(latest.getUTCFullYear() + REVIEW_WITHIN_YEARS);
  const earliest = new Date(`${today}T00:00:00Z`);
  earliest.setUTCDate(earliest.getUTCDate() + 1);
  return { earliest: earliest.toISOString().slice(0, 10), latest: latest.toISOString().slice(0, 10) };
}

/** What is wrong with a review date (YYYY-MM-DD), or null: a real calendar date, after today, not too far off. */
export function reviewDateProblem(value: string, now = new Date()): string | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(value)) return "Choose a review date";
  const date = new Date(`${value}T00:00:00Z`);
  if (Number.isNaN(date.getTime()) || date.toISOString().slice(0, 10) !== value) return "Choose a date that exists";
  const { earliest, latest } = reviewDateRange(now);
  if (value < earliest) return "The review date must be after today";
  if (value > latest) return `Choose a review date within ${REVIEW_WITHIN_YEARS} years`;
  return null;
}

/** The submit form's fields; the API adds the revision's version. */
export const submitFormSchema = z.object({
  approverId: z.uuid("Choose an approver"),
  reviewDate: z.string().superRefine((value, ctx) => {
    const problem = reviewDateProblem(value);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  }),
});

export const submitRevisionSchema = submitFormSchema.extend({ version: z.number().int().min(1) });

export type SubmitFormInput = z.infer<typeof submitFormSchema>;

/** The wizard's sections, by key: return comments and the review list name them. */
export const STEP_KEYS = ["scope", "sequence", "loads", "hazards", "people", "emergency"] as const;

/** Adding or replacing one task of a draft, at the version the client last saw. */
export const taskBodySchema = z.object({ version: z.number().int().min(1), task: taskSchema });
/** Removing a task: only the version. */
export const versionBodySchema = z.object({ version: z.number().int().min(1) });
