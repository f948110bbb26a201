"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { FormMessage, PrimaryButton, SelectField, TextField } from "@/app/_components/form";
import { createAssessmentSchema } from "@/assessments/revisions/schemas";
import { createAssessmentAction } from "./actions";

type Values = z.infer<typeof createAssessmentSchema>;

export function NewAssessmentForm({
  jobs,
  templates,
}: {
  jobs: { id: string; name: string }[];
  templates: { id: string; name: string; description: string }[];
}) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(createAssessmentSchema),
    defaultValues: { templateId: templates[0]?.id },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await createAssessmentAction({ ...values, templateId: values.templateId || undefined });
    if (result.ok) {
      router.push(`/revisions/${(result.data as { revisionId: string }).revisionId}`);
      return;
    }
    for (const issue of result.issues ?? []) setError(issue.path as keyof Values, { message: issue.message });
    setFailure(result.message);
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-4 rounded-lg border border-rule bg-white p-4"
      aria-label="New assessment"
    >
      {failure && <FormMessage tone="error">{failure}</FormMessage>}
      <SelectField label="Job" error={formState.errors.jobId?.message} {...register("jobId")} defaultValue="">
        <option value="" disabled>
          Choose a job…
        </option>
        {jobs.map((j) => (
          <option key={j.id} value={j.id}>
            {j.name}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Title"
        hint="What is being installed, and where, in a few words."
        error={formState.errors.title?.message}
        {...register("title")}
      />
      <fieldset>
        <legend className="text-sm font-bold">Start from</legend>
        <div className="mt-2 grid gap-2 md:grid-cols-2">
          {templates.map((t) => (
            <label
              key={t.id}
              className="flex cursor-pointer gap-2 rounded border border-rule p-3 has-[:checked]:border-accent has-[:checked]:bg-teal-50"
            >
              <input type="radio" value={t.id} {...register("templateId")} className="mt-1" />
              <span>
                <span className="block font-bold">{t.name}</span>
                <span className="text-sm text-muted">{t.description}</span>
              </span>
            </label>
          ))}
          <label className="flex cursor-pointer gap-2 rounded border border-rule p-3 has-[:checked]:border-accent has-[:checked]:bg-teal-50">
            <input type="radio" value="" {...register("templateId")} className="mt-1" />
            <span>
              <span className="block font-bold">A blank assessment</span>
              <span className="text-sm text-muted">Start with nothing filled in.</span>
            </span>
          </label>
        </div>
      </fieldset>
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Creating…" : "Create and open"}
      </PrimaryButton>
    </form>
  );
}
