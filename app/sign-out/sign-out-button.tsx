"use client";

import { signOut } from "next-auth/react";
import { PrimaryButton } from "@/app/_components/form";

export function SignOutButton() {
  return (
    <PrimaryButton type="button" className="w-full py-3 text-lg" onClick={() => signOut({ callbackUrl: "/sign-in" })}>
      Sign out
    </PrimaryButton>
  );
}
