import Link from "next/link";
import { AuthFrame } from "./auth-frame";

/** The page for an e-mailed link that cannot be used (expired, used, forged): why, and where to go. */
export function LinkProblem({
  message,
  href,
  action,
  testId = "link-problem",
}: {
  message: string;
  href: string;
  action: string;
  testId?: string;
}) {
  return (
    <AuthFrame title="This link cannot be used">
      <p data-testid={testId} className="text-muted">
        {message}
      </p>
      <Link href={href} className="mt-6 inline-block font-bold text-accent underline">
        {action}
      </Link>
    </AuthFrame>
  );
}
