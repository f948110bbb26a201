/**
 * The wizard's schemas and form resolvers. Loaded after the page is usable, never while it starts
 * (`checks.ts` is the one way in): zod and the content schema are the largest part of the wizard's
 * start-up work on a phone, and nothing needs them until the adviser changes something.
 */
import { zodResolver } from "@hookform/resolvers/zod";
import type { Resolver } from "react-hook-form";
import { contentSchema, taskSchema, type Content } from "@/assessments/method-statement/content";
import { submitFormSchema, type SubmitFormInput } from "@/assessments/revisions/schemas";

export { contentSchema, taskSchema };
export const contentResolver = zodResolver(contentSchema) as Resolver<Content>;
export const submitResolver = zodResolver(submitFormSchema) as Resolver<SubmitFormInput>;
