/**
 * The environment, read and checked once. A process with a missing or invalid variable refuses to
 * start (see instrumentation.ts) and names the variable, rather than failing later on a request.
 */
import { isIP } from "node:net";
import { z } from "zod";
import { databaseEnvSchema, pgliteDirOf, urlWithScheme } from "@/db/config";

const isProduction = () => process.env.NODE_ENV === "production";

const schema = z
  .object({
    ...databaseEnvSchema.shape,
    NEXTAUTH_SECRET: z.string().min(32, "must be at least 32 characters (e.g. `openssl rand -base64 32`)").optional(),
    NEXTAUTH_URL: z
      .url("must be the full origin the browser uses, e.g. http://localhost:3000")
      .default("http://localhost:3000"),
    SMTP_URL: urlWithScheme(["smtp", "smtps"], "smtp://127.0.0.1:2525").optional(),
    MAIL_FROM: z.string().trim().min(3).default("Heftwise <no-reply@heftwise.localhost>"),
    INVITE_TTL_HOURS: z.coerce
      .number()
      .int()
      .min(1)
      .max(24 * 30)
      .default(72),
    /** Addresses of reverse proxies whose X-Forwarded-For is believed; none by default. */
    HEFTWISE_TRUSTED_PROXIES: z
      .string()
      .trim()
      .default("")
      .transform((v) =>
        v
          .split(",")
          .map((a) => a.trim())
          .filter(Boolean),
      )
      .refine((list) => list.every((a) => isIP(a) !== 0), "must be a comma-separated list of IP addresses"),
  })
  .superRefine((env, ctx) => {
    if (!isProduction()) return;
    if (!env.NEXTAUTH_SECRET)
      ctx.addIssue({ code: "custom", path: ["NEXTAUTH_SECRET"], message: "is required in production" });
    if (!env.SMTP_URL) ctx.addIssue({ code: "custom", path: ["SMTP_URL"], message: "is required in production" });
  });

export type Config = z.infer<typeof schema> & { secret: string; smtpUrl: string; pgliteDir: string };

/** Used only outside production, so a developer can start without a .env file. */
const DEVELOPMENT_SECRET = "heftwise-development-secret-not-for-production-use";

export class ConfigError extends Error {
  constructor(public readonly problems: string[]) {
    super(`Heftwise cannot start: invalid configuration\n${problems.map((p) => `  - ${p}`).join("\n")}`);
  }
}

export function parseConfig(env: Record<string, string | undefined>): Config {
  const cleaned = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== undefined && v !== ""));
  const parsed = schema.safeParse(cleaned);
  if (!parsed.success) throw new ConfigError(parsed.error.issues.map((i) => `${i.path.join(".")} ${i.message}`));
  const c = parsed.data;
  return {
    ...c,
    secret: c.NEXTAUTH_SECRET ?? DEVELOPMENT_SECRET,
    smtpUrl: c.SMTP_URL ?? "smtp://127.0.0.1:2525",
    pgliteDir: pgliteDirOf(c.HEFTWISE_DATA_DIR),
  };
}

let cached: Config | undefined;

export function config(): Config {
  cached ??= parseConfig(process.env);
  return cached;
}

/** An absolute link to a page of this installation (e-mails, the pack's QR code): `appUrl("/verify")`. */
export const appUrl = (path: string) => `${config().NEXTAUTH_URL.replace(/\/$/, "")}${path}`;
