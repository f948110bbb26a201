"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { signInSchema, type SignInInput } from "@/lib/auth/schemas";

export function SignInForm({ callbackUrl, welcome }: { callbackUrl: string; welcome: boolean }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await signIn("credentials", { ...values, redirect: false });
    if (!result || result.error) {
      setFailure(
        result?.error && result.error !== "CredentialsSignin" ? result.error : "E-mail or password not recognised.",
      );
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {welcome && <FormMessage tone="success">Your password is set. Sign in to continue.</FormMessage>}
      {failure && <FormMessage tone="error">{failure}</FormMessage>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <PrimaryButton type="submit" disabled={formState.isSubmitting} className="w-full py-3 text-lg">
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </PrimaryButton>
    </form>
  );
}
