import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/app/_components/auth-frame";
import { ForgotPasswordForm } from "./forgot-password-form";

export const metadata: Metadata = { title: "Forgotten password" };

export default function ForgotPasswordPage() {
  return (
    <AuthFrame title="Forgotten password">
      <p className="mb-4 text-sm text-muted">
        Enter the address you sign in with. If it has an account, we e-mail it a link to choose a new password.
      </p>
      <ForgotPasswordForm />
      <Link href="/sign-in" className="mt-4 inline-block text-sm font-bold text-accent underline">
        Back to sign-in
      </Link>
    </AuthFrame>
  );
}
