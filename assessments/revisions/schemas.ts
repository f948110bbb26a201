/** Inputs of the revision workflow: one schema each, shared by forms and the server. */
import { z } from "zod";
import { contentSchema } from "../method-statement/content";

export const createAssessmentSchema = z.object({
  jobId: z.uuid("Choose a job"),
  title: z.string().trim().min(3, "Give the assessment a title").max(200, "Use at most 200 characters"),
  templateId: z.string().max(60).optional(),
});

export const saveRevisionSchema = z.object({
  version: z.number().int().min(1),
  content: contentSchema,
});

export const submitRevisionSchema = z.object({
  version: z.number().int().min(1),
  approverId: z.uuid("Choose an approver"),
  reviewDate: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Choose a review date"),
});


/** The wizard's sections, by key: return comments and the review list name them. */
export const STEP_KEYS = ["scope", "sequence", "loads", "hazards", "people", "emergency"] as const;
