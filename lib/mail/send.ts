/**
 * The one way Heftwise sends e-mail: nodemailer over SMTP (`SMTP_URL`; a local fake in development
 * and tests). Each message is logged in `outbound_emails` before it is sent, retried a few times,
 * and its outcome recorded, so a failure is visible and never silently lost.
 */
import { eq } from "drizzle-orm";
import nodemailer, { type Transporter } from "nodemailer";
import { getDb } from "@/db/client";
import { outboundEmails } from "@/db/schema";
import { config } from "@/lib/config";

export interface OutgoingMail {
  organisationId: string | null;
  kind: string;
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export interface SendOutcome {
  id: string;
  status: "sent" | "failed";
  error?: string;
}

const ATTEMPTS = 3;
const RETRY_DELAY_MS = 300;

const globalForMail = globalThis as unknown as { __heftwiseTransport?: Transporter };

function transport(): Transporter {
  if (!globalForMail.__heftwiseTransport) {
    const url = new URL(config().smtpUrl);
    const secure = url.protocol === "smtps:";
    globalForMail.__heftwiseTransport = nodemailer.createTransport({
      host: url.hostname,
      port: Number(url.port) || (secure ? 465 : 25),
      secure,
      // A plain smtp:// URL means a local or trusted relay: no opportunistic STARTTLS.
      ignoreTLS: !secure && url.searchParams.get("starttls") !== "1",
      auth: url.username
        ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) }
        : undefined,
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
    });
  }
  return globalForMail.__heftwiseTransport;
}

export async function sendMail(mail: OutgoingMail): Promise<SendOutcome> {
  const db = await getDb();
  const [row] = await db
    .insert(outboundEmails)
    .values({ organisationId: mail.organisationId, kind: mail.kind, toAddress: mail.to, subject: mail.subject })
    .returning({ id: outboundEmails.id });

  let lastError = "";
  for (let attempt = 1; attempt <= ATTEMPTS; attempt++) {
    try {
      const info = await transport().sendMail({
        from: config().MAIL_FROM,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        attachments: mail.attachments,
        headers: { "X-Heftwise-Kind": mail.kind },
      });
      await db
        .update(outboundEmails)
        .set({ status: "sent", attempts: attempt, sentAt: new Date(), messageId: info.messageId, lastError: null })
        .where(eq(outboundEmails.id, row.id));
      return { id: row.id, status: "sent" };
    } catch (err) {
      lastError = (err as Error).message;
      await db.update(outboundEmails).set({ attempts: attempt, lastError }).where(eq(outboundEmails.id, row.id));
      if (attempt < ATTEMPTS) await new Promise((r) => setTimeout(r, RETRY_DELAY_MS * attempt));
    }
  }
  await db.update(outboundEmails).set({ status: "failed" }).where(eq(outboundEmails.id, row.id));
  return { id: row.id, status: "failed", error: lastError };
}
