import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthFrame } from "@/app/_components/auth-frame";
import { getActor } from "@/lib/auth/session";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Set up your organisation" };

export default async function SignUpPage() {
  if (await getActor()) redirect("/");
  return (
    <AuthFrame title="Set up your organisation">
      <p className="mb-4 text-sm text-muted">
        For a contractor starting with Heftwise. You become its first administrator and invite your team afterwards. If
        your organisation already uses Heftwise, ask its administrator for an invitation instead.
      </p>
      <SignUpForm />
      <p className="mt-4 text-sm">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-bold text-accent underline">
          Sign in
        </Link>
      </p>
    </AuthFrame>
  );
}
