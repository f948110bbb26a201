"use client";

import { signOut } from "next-auth/react";
import { useState } from "react";
import { FormMessage, PrimaryButton, SecondaryButton } from "@/app/_components/form";
import { signOutEverywhereAction } from "./actions";

export function SignOutButton() {
  const [failure, setFailure] = useState<string | null>(null);
  const everywhere = async () => {
    setFailure(null);
    const result = await signOutEverywhereAction();
    if (!result.ok) {
      setFailure(result.message);
      return;
    }
    await signOut({ callbackUrl: "/sign-in" });
  };
  return (
    <div className="space-y-3">
      <PrimaryButton type="button" className="w-full py-3 text-lg" onClick={() => signOut({ callbackUrl: "/sign-in" })}>
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
