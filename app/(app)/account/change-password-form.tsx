"use client";

import { NewPasswordFields } from "@/app/_components/new-password-fields";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { changePasswordSchema, type ChangePasswordInput } from "@/lib/account/schemas";
import { changePasswordAction } from "./actions";

export function ChangePasswordForm() {
  const { register, onSubmit, formState, outcome, reset } = useActionForm<ChangePasswordInput>(
    changePasswordSchema,
    changePasswordAction,
    { onSuccess: () => reset({ current: "", password: "", confirm: "" }) },
  );
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-3 rounded-lg border border-rule bg-white p-4"
      aria-labelledby="password-heading"
    >
      <h2 id="password-heading" className="text-lg font-bold">
        Change password
      </h2>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.current?.message}
        {...register("current")}
      />
      <NewPasswordFields register={register} errors={formState.errors} repeatLabel="Repeat the new password" />
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Changing…" : "Change password"}
      </PrimaryButton>
    </form>
  );
}
