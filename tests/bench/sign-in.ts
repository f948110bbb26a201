/** Signs a demo user in over HTTP, as a browser does (CSRF token, then credentials); returns the session cookie. */
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";

export async function signInCookie(origin: string, email: string): Promise<string> {
  const csrf = await fetch(`${origin}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const cookie = csrf.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  const res = await fetch(`${origin}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie },
    body: new URLSearchParams({ csrfToken, email, password: DEMO_PASSWORD, json: "true" }),
  });
  const session = res.headers.getSetCookie().find((c) => c.startsWith("next-auth.session-token="));
  if (!session) throw new Error(`could not sign in as ${email} (HTTP ${res.status})`);
  return session.split(";")[0];
}
