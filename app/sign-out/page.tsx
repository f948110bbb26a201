import type { Metadata } from "next";
import { AuthFrame } from "@/app/_components/auth-frame";
import { SignOutButton } from "./sign-out-button";

export const metadata: Metadata = { title: "Sign out" };

export default function SignOutPage() {
  return (
    <AuthFrame title="Sign out">
      <p className="mb-4 text-muted">Sign out of Heftwise on this device? Do this on a shared phone or tablet.</p>
      <SignOutButton />
    </AuthFrame>
  );
}
