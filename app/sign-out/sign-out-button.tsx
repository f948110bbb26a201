"use client";

import { signOut } from "next-auth/react";
import { useEffect, useState } from "react";
import { forgetCopies, waitingOnPhone } from "@/app/(app)/briefings/device/copies";
import { FormMessage, PrimaryButton, SecondaryButton } from "@/app/_components/form";
import { signOutEverywhereAction } from "./actions";

/** Signing out also removes the briefings kept on this phone; records waiting to be sent stay. */
async function leave() {
  await forgetCopies().catch(() => undefined);
  await signOut({ callbackUrl: "/sign-in" });
}

export function SignOutButton() {
  const [failure, setFailure] = useState<string | null>(null);
  const [waiting, setWaiting] = useState(0);
  useEffect(() => {
    waitingOnPhone().then(setWaiting, () => undefined);
  }, []);
  const everywhere = async () => {
    setFailure(null);
    const result = await signOutEverywhereAction();
    if (!result.ok) {
      setFailure(result.message);
      return;
    }
    await leave();
  };
  return (
    <div className="space-y-3">
      {waiting > 0 && (
        <FormMessage tone="error">
          {waiting} briefing record{waiting === 1 ? " is" : "s are"} still waiting on this phone to be sent. They stay
          on the phone and are sent when the same person signs in again with signal.
        </FormMessage>
      )}
      <PrimaryButton type="button" className="w-full py-3 text-lg" onClick={leave}>
        Sign out
      </PrimaryButton>
      <SecondaryButton type="button" className="w-full py-3" onClick={everywhere}>
        Sign out everywhere
      </SecondaryButton>
      <p className="text-sm text-muted">
        &ldquo;Everywhere&rdquo; also ends your sessions on other phones and computers, such as a site office PC left
        signed in.
      </p>
      {failure && <FormMessage tone="error">{failure}</FormMessage>}
    </div>
  );
}
