"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FieldError, FormMessage, PrimaryButton, SecondaryButton } from "@/app/_components/form";
import { removeLogoAction, setLogoAction } from "./actions";

export function LogoForm({ hasLogo }: { hasLogo: boolean }) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [busy, setBusy] = useState(false);
  const run = async (action: () => ReturnType<typeof removeLogoAction>) => {
    setBusy(true);
    setOutcome(null);
    setFieldError(undefined);
    const result = await action();
    setBusy(false);
    if (result.ok) {
      setOutcome({ tone: "success", text: result.message ?? "Saved." });
      router.refresh();
    } else {
      setFieldError(result.issues?.find((i) => i.path === "logo")?.message);
      setOutcome({ tone: "error", text: result.message });
    }
  };
  return (
    <form
      className="space-y-3 rounded-lg border border-rule bg-white p-4"
      aria-labelledby="logo-heading"
      onSubmit={(e) => {
        e.preventDefault();
        const form = new FormData(e.currentTarget);
        void run(() => setLogoAction(form));
      }}
    >
      <h2 id="logo-heading" className="text-lg font-bold">
        Logo on the pack cover
      </h2>
      <p className="text-sm text-muted">PNG or JPEG, at most 300 kB. {hasLogo ? "A logo is set." : "No logo yet."}</p>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      {hasLogo && (
        // eslint-disable-next-line @next/next/no-img-element -- the organisation's own logo, served by the app
        <img src="/api/v1/organisation/logo" alt="Current logo" className="h-12 rounded border border-rule" />
      )}
      <label className="block font-bold">
        Logo file
        <input
          type="file"
          name="logo"
          accept="image/png,image/jpeg"
          className="mt-1 block"
          aria-invalid={!!fieldError}
        />
      </label>
      <FieldError message={fieldError} />
      <div className="flex gap-2">
        <PrimaryButton type="submit" disabled={busy}>
          Upload logo
        </PrimaryButton>
        {hasLogo && (
          <SecondaryButton type="button" disabled={busy} onClick={() => void run(removeLogoAction)}>
            Remove logo
          </SecondaryButton>
        )}
      </div>
    </form>
  );
}
