"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { NewPasswordFields } from "@/app/_components/new-password-fields";
import { FormMessage, PrimaryButton } from "@/app/_components/form";
import { setPasswordSchema, type SetPasswordInput } from "@/lib/auth/schemas";
import { acceptInviteAction } from "./actions";

export function SetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SetPasswordInput>({
    resolver: zodResolver(setPasswordSchema),
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await acceptInviteAction(token, values);
    if (result.ok) {
      router.replace("/sign-in?welcome=1");
      return;
    }
    for (const issue of result.issues ?? []) setError(issue.path as keyof SetPasswordInput, { message: issue.message });
    if (!result.issues?.length) setFailure(result.message);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {failure && <FormMessage tone="error">{failure}</FormMessage>}
      <NewPasswordFields register={register} errors={formState.errors} />
      <PrimaryButton type="submit" disabled={formState.isSubmitting} className="w-full py-3 text-lg">
        {formState.isSubmitting ? "Saving…" : "Set password"}
      </PrimaryButton>
    </form>
  );
}
