"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { FormMessage, PrimaryButton, SecondaryButton, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { confirmWithCodeSchema, type ConfirmWithCodeInput } from "@/lib/account/schemas";
import { disableSecondFactorAction, renewRecoveryCodesAction } from "../actions";
import { RecoveryCodes } from "./recovery-codes";
import type { ActionResult } from "@/lib/actions";

export function ManageSecondFactor({
  since,
  recoveryCodesLeft,
  required,
}: {
  since: string;
  recoveryCodesLeft: number;
  required: boolean;
}) {
  const router = useRouter();
  const [codes, setCodes] = useState<string[] | null>(null);
  // Which button submitted: read when the form submits, in the same event (a ref, not state).
  const intent = useRef<"renew" | "disable">("renew");
  const { register, onSubmit, formState, outcome, reset } = useActionForm<
    ConfirmWithCodeInput,
    { recoveryCodes: string[] }
  >(
    confirmWithCodeSchema,
    async (values) =>
      intent.current === "renew"
        ? renewRecoveryCodesAction(values)
        : ((await disableSecondFactorAction(values)) as ActionResult<{ recoveryCodes: string[] }>),
    {
      onSuccess: (result) => {
        reset({ password: "", code: "" });
        if (result.data?.recoveryCodes) setCodes(result.data.recoveryCodes);
        else router.refresh();
      },
    },
  );
  return (
    <div className="space-y-4">
      <p data-testid="second-factor-on">
        <strong>On</strong> since {since}. {recoveryCodesLeft} recovery code{recoveryCodesLeft === 1 ? "" : "s"} left.
      </p>
      {codes && <RecoveryCodes codes={codes} />}
      <form
        onSubmit={onSubmit}
        noValidate
        className="space-y-3 rounded-lg border border-rule bg-white p-4"
        aria-labelledby="manage-heading"
      >
        <h2 id="manage-heading" className="text-lg font-bold">
          New recovery codes{required ? "" : ", or turn it off"}
        </h2>
        <p className="text-sm text-muted">
          Confirm with your password and a code from your app.
          {required ? " Your organisation requires a second factor for your role, so it cannot be turned off." : ""}
        </p>
        {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Password"
            type="password"
            autoComplete="current-password"
            error={formState.errors.password?.message}
            {...register("password")}
          />
          <TextField
            label="Code from your app"
            autoComplete="one-time-code"
            error={formState.errors.code?.message}
            {...register("code")}
          />
        </div>
        <div className="flex flex-wrap gap-2">
          <PrimaryButton type="submit" disabled={formState.isSubmitting} onClick={() => (intent.current = "renew")}>
            Make new recovery codes
          </PrimaryButton>
          {!required && (
            <SecondaryButton
              type="submit"
              disabled={formState.isSubmitting}
              onClick={() => (intent.current = "disable")}
            >
              Turn the second factor off
            </SecondaryButton>
          )}
        </div>
      </form>
    </div>
  );
}
