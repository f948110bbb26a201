"use client";

import { useState } from "react";
import { FormMessage, PrimaryButton, SelectField, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { createTokenSchema, TOKEN_LIFETIMES_DAYS, type CreateTokenInput } from "@/lib/api-tokens/schemas";
import { createTokenAction } from "./actions";

export function CreateTokenForm({ scopes }: { scopes: { value: string; label: string }[] }) {
  const [created, setCreated] = useState<string | null>(null);
  const { register, onSubmit, formState, outcome, reset } = useActionForm<CreateTokenInput, { token: string }>(
    createTokenSchema,
    createTokenAction,
    {
      defaultValues: { scope: scopes[scopes.length - 1]?.value as CreateTokenInput["scope"], days: 90 },
      onSuccess: (result) => {
        setCreated(result.data?.token ?? null);
        reset();
      },
    },
  );
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-3 rounded-lg border border-rule bg-white p-4"
      aria-labelledby="new-token-heading"
    >
      <h2 id="new-token-heading" className="text-lg font-bold">
        New token
      </h2>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      {created && (
        <div className="rounded border-2 border-accent p-3" role="status">
          <p className="font-bold">Copy the token now: it is shown only this once.</p>
          <code data-testid="new-token" className="mt-2 block break-all rounded bg-paper p-2 text-sm">
            {created}
          </code>
        </div>
      )}
      <div className="grid gap-3 md:grid-cols-3">
        <TextField
          label="What it is for"
          placeholder="e.g. Document control sync"
          error={formState.errors.name?.message}
          {...register("name")}
        />
        <SelectField label="Scope" error={formState.errors.scope?.message} {...register("scope")}>
          {scopes.map((s) => (
            <option key={s.value} value={s.value}>
              Same as {s.label.toLowerCase()}
            </option>
          ))}
        </SelectField>
        <SelectField label="Works for" error={formState.errors.days?.message} {...register("days")}>
          {TOKEN_LIFETIMES_DAYS.map((d) => (
            <option key={d} value={d}>
              {d} days
            </option>
          ))}
        </SelectField>
      </div>
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Creating…" : "Create token"}
      </PrimaryButton>
    </form>
  );
}
