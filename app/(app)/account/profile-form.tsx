"use client";

import { useRouter } from "next/navigation";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { profileSchema, type ProfileInput } from "@/lib/account/schemas";
import { updateProfileAction } from "./actions";

export function ProfileForm({ name }: { name: string }) {
  const router = useRouter();
  const { register, onSubmit, formState, outcome } = useActionForm<ProfileInput>(profileSchema, updateProfileAction, {
    defaultValues: { name },
    onSuccess: () => router.refresh(),
  });
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-3 rounded-lg border border-rule bg-white p-4"
      aria-labelledby="profile-heading"
    >
      <h2 id="profile-heading" className="text-lg font-bold">
        Profile
      </h2>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <TextField
        label="Your name"
        hint="As it appears on assessments and in e-mails."
        autoComplete="name"
        error={formState.errors.name?.message}
        {...register("name")}
      />
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        Save
      </PrimaryButton>
    </form>
  );
}
