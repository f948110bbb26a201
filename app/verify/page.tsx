import type { Metadata } from "next";
import { AuthFrame } from "@/app/_components/auth-frame";
import { VerifyForm } from "./verify-form";

export const metadata: Metadata = { title: "Check a pack" };

/** Public: anyone holding a Heftwise pack can check it here, without an account. */
export default function VerifyPage() {
  return (
    <AuthFrame title="Check a Heftwise pack">
      <p className="mb-4 text-sm text-muted">
        Upload the PDF. You will see whether it is a pack Heftwise issued, unaltered, and whether that revision is
        approved or has been superseded.
      </p>
      <VerifyForm />
    </AuthFrame>
  );
}
