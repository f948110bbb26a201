/** Inputs of the revision workflow: one schema each, shared by forms and the server. */
import { z } from "zod";
import { contentSchema, taskSchema } from "../method-statement/content";
import { reviewDateProblem } from "./review-date";

export const createAssessmentSchema = z.object({
  jobId: z.uuid("Choose a job"),
  title: z.string().trim().min(3, "Give the assessment a title").max(200, "Use at most 200 characters"),
  templateId: z.string().max(60).optional(),
});

export const saveRevisionSchema = z.object({
  version: z.number().int().min(1),
  content: contentSchema,
});

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
