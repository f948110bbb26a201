"use client";

import { useRouter } from "next/navigation";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { resetPasswordSchema } from "@/lib/account/schemas";
import { PASSWORD_MIN, type SetPasswordInput } from "@/lib/auth/schemas";
import { resetPasswordAction } from "@/app/forgot-password/actions";

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const { register, onSubmit, formState, outcome } = useActionForm<SetPasswordInput>(
    resetPasswordSchema,
    (values) => resetPasswordAction(token, values),
    { onSuccess: () => router.replace("/sign-in?notice=password-reset") },
  );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <TextField
        label="New password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        type="password"
        autoComplete="new-password"
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <TextField
        label="Repeat the password"
        type="password"
        autoComplete="new-password"
        error={formState.errors.confirm?.message}
        {...register("confirm")}
      />
      <PrimaryButton type="submit" disabled={formState.isSubmitting} className="w-full py-3 text-lg">
        {formState.isSubmitting ? "Saving…" : "Set the new password"}
      </PrimaryButton>
    </form>
  );
}
