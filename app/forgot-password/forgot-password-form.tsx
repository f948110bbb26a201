"use client";

import { useState } from "react";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { forgotPasswordSchema, type ForgotPasswordInput } from "@/lib/account/schemas";
import { requestPasswordResetAction } from "./actions";

export function ForgotPasswordForm() {
  const [sent, setSent] = useState(false);
  const { register, onSubmit, formState, outcome } = useActionForm<ForgotPasswordInput>(
    forgotPasswordSchema,
    requestPasswordResetAction,
    { onSuccess: () => setSent(true) },
  );
  if (sent)
    return (
      <FormMessage tone="success">
        If that address has a Heftwise account, a reset link is on its way. It works once, for one hour.
      </FormMessage>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <PrimaryButton type="submit" disabled={formState.isSubmitting} className="w-full py-3 text-lg">
        {formState.isSubmitting ? "Sending…" : "Send the reset link"}
      </PrimaryButton>
    </form>
  );
}
