"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { FormMessage, PrimaryButton, SelectField, TextField } from "@/app/_components/form";
import { ROLES } from "@/db/schema";
import { inviteSchema, ROLE_LABELS, type InviteInput } from "@/lib/users/schemas";
import { inviteUserAction } from "./actions";

export function InviteForm() {
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<InviteInput>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { role: "adviser" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setOutcome(null);
    const result = await inviteUserAction(values);
    if (result.ok) {
      reset({ email: "", name: "", role: values.role });
      setOutcome({ tone: "success", text: result.message ?? "Invited." });
      return;
    }
    for (const issue of result.issues ?? []) setError(issue.path as keyof InviteInput, { message: issue.message });
    setOutcome({ tone: "error", text: result.message });
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-3 rounded-lg border border-rule bg-white p-4"
      aria-labelledby="invite-heading"
    >
      <h2 id="invite-heading" className="text-lg font-bold">
        Invite someone
      </h2>
      <p className="text-sm text-muted">They receive an e-mail with a one-time link to set their password.</p>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <div className="grid gap-3 md:grid-cols-3">
        <TextField label="Name" error={formState.errors.name?.message} {...register("name")} />
        <TextField label="E-mail" type="email" error={formState.errors.email?.message} {...register("email")} />
        <SelectField label="Role" error={formState.errors.role?.message} {...register("role")}>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </SelectField>
      </div>
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Sending…" : "Send invitation"}
      </PrimaryButton>
    </form>
  );
}
