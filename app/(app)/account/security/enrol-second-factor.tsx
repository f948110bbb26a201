"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormMessage, PrimaryButton, SecondaryButton, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { totpCodeSchema, type TotpCodeInput } from "@/lib/account/schemas";
import { confirmSecondFactorAction, startSecondFactorAction } from "../actions";
import { RecoveryCodes } from "./recovery-codes";

export function EnrolSecondFactor() {
  const router = useRouter();
  const [setup, setSetup] = useState<{ secret: string; svg: string } | null>(null);
  const [codes, setCodes] = useState<string[] | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const { register, onSubmit, formState, outcome } = useActionForm<TotpCodeInput, { recoveryCodes: string[] }>(
    totpCodeSchema,
    confirmSecondFactorAction,
    { onSuccess: (result) => setCodes(result.data?.recoveryCodes ?? []) },
  );
  if (codes)
    return (
      <div className="space-y-4">
        <FormMessage tone="success">The second factor is on.</FormMessage>
        <RecoveryCodes codes={codes} />
        <PrimaryButton type="button" onClick={() => router.push("/")}>
          I have saved them — continue
        </PrimaryButton>
      </div>
    );
  if (!setup)
    return (
      <div className="space-y-3">
        {failure && <FormMessage tone="error">{failure}</FormMessage>}
        <PrimaryButton
          type="button"
          onClick={async () => {
            const result = await startSecondFactorAction();
            if (result.ok && result.data) setSetup(result.data);
            else if (!result.ok) setFailure(result.message);
          }}
        >
          Set up an authenticator app
        </PrimaryButton>
      </div>
    );
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-4 rounded-lg border border-rule bg-white p-4"
      aria-labelledby="enrol-heading"
    >
      <h2 id="enrol-heading" className="text-lg font-bold">
        Scan, then enter a code
      </h2>
      <ol className="list-decimal space-y-1 pl-5 text-sm">
        <li>Open your authenticator app and add an account by scanning this code.</li>
        <li>Can&apos;t scan? Type the key below into the app instead (time-based, six digits).</li>
        <li>Enter the six digits the app now shows for Heftwise.</li>
      </ol>
      <div
        className="h-48 w-48 rounded border border-rule bg-white"
        role="img"
        aria-label="QR code for the authenticator app"
        // Our own SVG, drawn on the server from the otpauth address.
        dangerouslySetInnerHTML={{ __html: setup.svg }}
      />
      <p className="text-sm">
        Key:{" "}
        <code data-testid="totp-secret" className="break-all font-mono">
          {setup.secret}
        </code>
      </p>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <TextField
        label="Code from the app"
        inputMode="numeric"
        autoComplete="one-time-code"
        error={formState.errors.code?.message}
        {...register("code")}
      />
      <div className="flex gap-2">
        <PrimaryButton type="submit" disabled={formState.isSubmitting}>
          Turn on
        </PrimaryButton>
        <SecondaryButton type="button" onClick={() => setSetup(null)}>
          Cancel
        </SecondaryButton>
      </div>
    </form>
  );
}
