import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { AuthFrame } from "@/app/_components/auth-frame";
import { safeCallbackPath } from "@/lib/auth/callback";
import { getActor } from "@/lib/auth/session";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

const NOTICES: Record<string, string> = {
  welcome: "Your password is set. Sign in to continue.",
  "password-reset": "Your password is changed, and every other session is signed out. Sign in with the new password.",
  "email-confirmed": "Your e-mail address is confirmed. Sign in to start.",
};

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<{ callbackUrl?: string; welcome?: string; notice?: string }>;
}) {
  if (await getActor()) redirect("/");
  const { callbackUrl, welcome, notice } = await searchParams;
  // Only paths on this site: an open redirect would let a link send people elsewhere after sign-in.
  const target = safeCallbackPath(callbackUrl);
  return (
    <AuthFrame title="Sign in">
      <p className="mb-4 text-sm text-muted">Manual-handling and lift-plan assessments for your sites.</p>
      <SignInForm
        callbackUrl={target}
        notice={welcome === "1" ? NOTICES.welcome : notice && notice in NOTICES ? NOTICES[notice] : null}
      />
    </AuthFrame>
  );
}
