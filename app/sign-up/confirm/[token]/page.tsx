import type { Metadata } from "next";
import { AuthFrame } from "@/app/_components/auth-frame";
import { LinkProblem } from "@/app/_components/link-problem";
import { inspectAccountLink } from "@/lib/account/service";
import { ConfirmButton } from "./confirm-button";

export const metadata: Metadata = { title: "Confirm your address", robots: { index: false } };

// Opening the link changes nothing (mail scanners open links too); the button confirms.
export default async function ConfirmEmailPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await inspectAccountLink(token, "verify-email");
  if (link.state !== "valid") return <LinkProblem message={link.message} href="/sign-in" action="Go to sign-in" />;
  return (
    <AuthFrame title="Confirm your address">
      <p className="mb-4 text-muted">One step left: confirm that this address is yours, then sign in.</p>
      <ConfirmButton token={token} />
    </AuthFrame>
  );
}
