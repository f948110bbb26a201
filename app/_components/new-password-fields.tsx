"use client";

import type { FieldErrors, FieldValues, Path, UseFormRegister } from "react-hook-form";
import { PASSWORD_MIN } from "@/lib/auth/schemas";
import { TextField } from "./form";

/** A new password and its repeat, for any form whose schema has `password` and `confirm`. */
export function NewPasswordFields<Values extends FieldValues & { password: string; confirm: string }>({
  register,
  errors,
  label = "New password",
  repeatLabel = "Repeat the password",
}: {
  register: UseFormRegister<Values>;
  errors: FieldErrors<Values>;
  label?: string;
  repeatLabel?: string;
}) {
  return (
    <>
      <TextField
        label={label}
        hint={`At least ${PASSWORD_MIN} characters.`}
        type="password"
        autoComplete="new-password"
        error={errors.password?.message as string | undefined}
        {...register("password" as Path<Values>)}
      />
      <TextField
        label={repeatLabel}
        type="password"
        autoComplete="new-password"
        error={errors.confirm?.message as string | undefined}
        {...register("confirm" as Path<Values>)}
      />
    </>
  );
}
