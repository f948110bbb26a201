"use client";

import { useState } from "react";
import { NewPasswordFields } from "@/app/_components/new-password-fields";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { signUpSchema, type SignUpInput } from "@/lib/account/schemas";
import { signUpAction } from "./actions";

export function SignUpForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { register, onSubmit, formState, outcome, getValues } = useActionForm<SignUpInput>(signUpSchema, signUpAction, {
    onSuccess: () => setSentTo(getValues("email")),
  });
  if (sentTo)
    return (
      <div data-testid="sign-up-sent">
        <FormMessage tone="success">
          Check your inbox: we sent a link to {sentTo}. Open it to confirm the address, then sign in.
        </FormMessage>
        <p className="mt-3 text-sm text-muted">
          Nothing arrived after a few minutes? Look in the junk folder, or sign up again with the same address to get a
          new link.
        </p>
      </div>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <TextField label="Organisation" error={formState.errors.organisation?.message} {...register("organisation")} />
      <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <TextField
        label="Your work e-mail"
        type="email"
        autoComplete="email"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <NewPasswordFields register={register} errors={formState.errors} label="Password" />
      <PrimaryButton type="submit" disabled={formState.isSubmitting} className="w-full py-3 text-lg">
        {formState.isSubmitting ? "Setting up…" : "Set up the organisation"}
      </PrimaryButton>
    </form>
  );
}
