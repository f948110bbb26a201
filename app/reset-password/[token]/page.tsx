import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/app/_components/auth-frame";
import { inspectAccountLink } from "@/lib/account/service";
import { ResetPasswordForm } from "./reset-password-form";

export const metadata: Metadata = { title: "Choose a new password", robots: { index: false } };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await inspectAccountLink(token, "reset-password");
  if (link.state !== "valid")
    return (
      <AuthFrame title="This link cannot be used">
        <p data-testid="link-problem" className="text-muted">
          {link.message}
        </p>
        <Link href="/forgot-password" className="mt-6 inline-block font-bold text-accent underline">
          Ask for a new link
        </Link>
      </AuthFrame>
    );
  return (
    <AuthFrame title="Choose a new password">
      <p className="mb-4 text-sm text-muted">Setting it signs your account out on every device.</p>
      <ResetPasswordForm token={token} />
    </AuthFrame>
  );
}
