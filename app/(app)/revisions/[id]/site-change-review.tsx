"use client";

import { FormMessage, SecondaryButton } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { siteChangeDecisionSchema, type SiteChangeDecisionInput } from "@/assessments/briefing/schemas";
import { decideSiteChangesAction } from "./actions";

/** The adviser's decision on reported site changes: the assessment still holds (with the reason). */
export function SiteChangeDecision({ revisionId }: { revisionId: string }) {
  const { register, onSubmit, formState, outcome } = useActionForm<SiteChangeDecisionInput>(
    siteChangeDecisionSchema,
    (values) => decideSiteChangesAction(revisionId, values),
  );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-2">
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <label className="block text-sm font-bold">
        No change needed? Say why the assessment still holds
        <textarea
          rows={2}
          aria-invalid={!!formState.errors.note}
          className="mt-1 block w-full rounded border border-rule px-2 py-1.5 font-normal"
          {...register("note")}
        />
      </label>
      {formState.errors.note && <p className="text-sm font-bold text-danger">{formState.errors.note.message}</p>}
      <SecondaryButton type="submit" disabled={formState.isSubmitting}>
        Record: no change needed
      </SecondaryButton>
    </form>
  );
}
