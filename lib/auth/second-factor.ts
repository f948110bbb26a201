/**
 * The second factor: time-based one-time codes from an authenticator app (RFC 6238: six digits,
 * 30-second steps, SHA-1 — what the common apps use), and ten single-use recovery codes for a lost
 * phone. The secret is stored encrypted with the server's secret; a code is never accepted twice.
 */
import { createCipheriv, createDecipheriv, createHash, randomBytes } from "node:crypto";
import { and, eq, isNull } from "drizzle-orm";
import { generateSecret, generateURI, verify } from "otplib";
import QRCode from "qrcode";
import { getDb, type Tx } from "@/db/client";
import { recoveryCodes, users } from "@/db/schema";
import { config } from "@/lib/config";

export const RECOVERY_CODE_COUNT = 10;
/** How far a phone's clock may drift: one step either side (common practice, RFC 6238 §5.2 allows it). */
const TOLERANCE_S = 30;

const key = () => createHash("sha256").update(`heftwise-second-factor:${config().secret}`).digest();

export function sealSecret(secret: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", key(), iv);
  const data = Buffer.concat([cipher.update(secret, "utf8"), cipher.final()]);
  return [iv, cipher.getAuthTag(), data].map((b) => b.toString("base64url")).join(".");
}

export function openSecret(sealed: string): string {
  const [iv, tag, data] = sealed.split(".").map((p) => Buffer.from(p, "base64url"));
  const decipher = createDecipheriv("aes-256-gcm", key(), iv);
  decipher.setAuthTag(tag);
  return Buffer.concat([decipher.update(data), decipher.final()]).toString("utf8");
}

export const newTotpSecret = () => generateSecret();

/** What an authenticator app scans: the otpauth:// URI and its QR code as an SVG. */
export async function enrolmentCode(secret: string, email: string) {
  const uri = generateURI({ issuer: "Heftwise", label: email, secret });
  return { uri, svg: await QRCode.toString(uri, { type: "svg", margin: 1, errorCorrectionLevel: "M" }) };
}

/** The time step a code matches (for replay protection), or null. Never a step at or before `after`. */
export async function matchTotp(secret: string, code: string, after: number | null): Promise<number | null> {
  if (!/^\d{6}$/.test(code)) return null;
  const result = await verify({
    secret,
    token: code,
    epochTolerance: TOLERANCE_S,
    ...(after !== null ? { afterTimeStep: after } : {}),
  }).catch(() => ({ valid: false as const }));
  return result.valid && "timeStep" in result ? result.timeStep : null;
}

const hashCode = (code: string) =>
  createHash("sha256")
    .update(code.replace(/[^a-z0-9]/gi, "").toLowerCase())
    .digest("hex");

/** Ten fresh recovery codes ("abcde-fghij"), replacing any earlier ones; returned once, stored hashed. */
export async function replaceRecoveryCodes(tx: Tx, userId: string): Promise<string[]> {
  const alphabet = "abcdefghjkmnpqrstuvwxyz23456789";
  const codes = Array.from({ length: RECOVERY_CODE_COUNT }, () => {
    const chars = [...randomBytes(10)].map((b) => alphabet[b % alphabet.length]).join("");
    return `${chars.slice(0, 5)}-${chars.slice(5)}`;
  });
  await tx.delete(recoveryCodes).where(eq(recoveryCodes.userId, userId));
  await tx.insert(recoveryCodes).values(codes.map((c) => ({ userId, codeHash: hashCode(c) })));
  return codes;
}

export type SecondFactorMethod = "authenticator" | "recovery-code";

/**
 * Checks a code from the user's app, or one of their recovery codes, and spends it: the matched
 * time step is remembered (the same code cannot be replayed), a recovery code is marked used.
 */
export async function spendSecondFactor(
  user: { id: string; totpSecret: string | null; totpLastStep: number | null },
  code: string,
): Promise<SecondFactorMethod | null> {
  const typed = code.trim();
  const db = await getDb();
  if (/^\d{6}$/.test(typed.replace(/\s/g, ""))) {
    if (!user.totpSecret) return null;
    const step = await matchTotp(openSecret(user.totpSecret), typed.replace(/\s/g, ""), user.totpLastStep);
    if (step === null) return null;
    // Only one request can move the step forward past this code.
    const [moved] = await db
      .update(users)
      .set({ totpLastStep: step })
      .where(
        and(
          eq(users.id, user.id),
          user.totpLastStep === null ? isNull(users.totpLastStep) : eq(users.totpLastStep, user.totpLastStep),
        ),
      )
      .returning({ id: users.id });
    return moved ? "authenticator" : null;
  }
  const [used] = await db
    .update(recoveryCodes)
    .set({ usedAt: new Date() })
    .where(
      and(eq(recoveryCodes.userId, user.id), eq(recoveryCodes.codeHash, hashCode(typed)), isNull(recoveryCodes.usedAt)),
    )
    .returning({ id: recoveryCodes.id });
  return used ? "recovery-code" : null;
}
