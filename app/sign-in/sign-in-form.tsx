"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { signInSchema, type SignInInput } from "@/lib/auth/schemas";

/** The answer next-auth passes on when the password was right and a second-factor code is due. */
const SECOND_FACTOR_NEEDED = "second-factor-needed";

export function SignInForm({ callbackUrl, notice }: { callbackUrl: string; notice: string | null }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const [needsCode, setNeedsCode] = useState(false);
  const { register, handleSubmit, formState, setFocus } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await signIn("credentials", { ...values, code: values.code ?? "", redirect: false });
    if (result?.error === SECOND_FACTOR_NEEDED) {
      setNeedsCode(true);
      setTimeout(() => setFocus("code"), 0);
      return;
    }
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
      {notice && <FormMessage tone="success">{notice}</FormMessage>}
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
      {needsCode && (
        <TextField
          label="Code from your authenticator app"
          hint="Six digits, or one of your recovery codes."
          autoComplete="one-time-code"
          inputMode="text"
          error={formState.errors.code?.message}
          {...register("code")}
        />
      )}
      <PrimaryButton type="submit" disabled={formState.isSubmitting} className="w-full py-3 text-lg">
        {formState.isSubmitting ? "Signing in…" : needsCode ? "Confirm and sign in" : "Sign in"}
      </PrimaryButton>
      <p className="flex flex-wrap justify-between gap-2 text-sm">
        <Link href="/forgot-password" className="font-bold text-accent underline">
          Forgotten your password?
        </Link>
        <Link href="/sign-up" className="font-bold text-accent underline">
          Set up a new organisation
        </Link>
      </p>
    </form>
  );
}
