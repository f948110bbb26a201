"use client";

import { useRouter } from "next/navigation";
import { NewPasswordFields } from "@/app/_components/new-password-fields";
import { FormMessage, PrimaryButton } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { resetPasswordSchema } from "@/lib/account/schemas";
import { type SetPasswordInput } from "@/lib/auth/schemas";
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
      <NewPasswordFields register={register} errors={formState.errors} />
      <PrimaryButton type="submit" disabled={formState.isSubmitting} className="w-full py-3 text-lg">
        {formState.isSubmitting ? "Saving…" : "Set the new password"}
      </PrimaryButton>
    </form>
  );
}
