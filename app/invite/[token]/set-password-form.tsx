"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { PASSWORD_MIN, setPasswordSchema, type SetPasswordInput } from "@/lib/auth/schemas";
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
        {formState.isSubmitting ? "Saving…" : "Set password"}
      </PrimaryButton>
    </form>
  );
}
