"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormMessage, PrimaryButton } from "@/app/_components/form";
import { confirmEmailAction } from "../../actions";

export function ConfirmButton({ token }: { token: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <div className="space-y-4">
      {failure && <FormMessage tone="error">{failure}</FormMessage>}
      <PrimaryButton
        type="button"
        disabled={busy}
        className="w-full py-3 text-lg"
        onClick={async () => {
          setBusy(true);
          const result = await confirmEmailAction(token);
          setBusy(false);
          if (result.ok) router.replace("/sign-in?notice=email-confirmed");
          else setFailure(result.message);
        }}
      >
        {busy ? "Confirming…" : "Confirm my address"}
      </PrimaryButton>
    </div>
  );
}
