/**
 * A local SMTP fake for development and tests: accepts every message on 127.0.0.1, keeps it in
 * memory, and shows an inbox over HTTP (HTML at `/`, JSON at `/api/messages`). Never used in
 * production.
 */
import { createServer, type Server } from "node:http";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface FakeMessage {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  attachments: { filename: string; contentType: string; size: number }[];
  kind: string | null;
}

export interface MailFake {
  smtpPort: number;
  httpPort: number;
  messages: FakeMessage[];
  close: () => Promise<void>;
}

const escape = (s: string) =>
  s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c]!);

function inboxPage(messages: FakeMessage[]): string {
  const rows = [...messages]
    .reverse()
    .map(
      (m) =>
        `<tr><td>${escape(m.receivedAt.replace("T", " ").slice(0, 19))}</td><td>${escape(m.to.join(", "))}</td><td><a href="/messages/${m.id}">${escape(m.subject)}</a></td><td>${m.attachments.length || ""}</td></tr>`,
    )
    .join("");
  return `<!doctype html><meta charset="utf-8"><title>Heftwise mail fake</title>
<style>body{font-family:system-ui,sans-serif;margin:24px;color:#17201c}table{border-collapse:collapse;width:100%}td,th{border-bottom:1px solid #ccd;padding:6px 8px;text-align:left}th{background:#16302b;color:#f3efe4}</style>
<h1>Mail received by the local fake</h1><p>${messages.length} message(s). Nothing here left this machine.</p>
<table><tr><th>Received (UTC)</th><th>To</th><th>Subject</th><th>Attachments</th></tr>${rows}</table>`;
}

export async function startMailFake({ smtpPort = 2525, httpPort = 1080 } = {}): Promise<MailFake> {
  const messages: FakeMessage[] = [];
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          messages.push({
            id: messages.length + 1,
            receivedAt: new Date().toISOString(),
            from: mail.from?.text ?? "",
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : "",
            attachments: mail.attachments.map((a) => ({
              filename: a.filename ?? "",
              contentType: a.contentType,
              size: a.size,
            })),
            kind: (mail.headers.get("x-heftwise-kind") as string | undefined) ?? null,
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(smtpPort, "127.0.0.1", () => resolve());
  });

  const http: Server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    if (url.pathname === "/api/messages" && req.method === "DELETE") {
      messages.length = 0;
      res.writeHead(204).end();
    } else if (url.pathname === "/api/messages") {
      res.writeHead(200, { "content-type": "application/json" }).end(JSON.stringify(messages));
    } else if (url.pathname.startsWith("/messages/")) {
      const message = messages.find((m) => m.id === Number(url.pathname.split("/")[2]));
      if (!message) res.writeHead(404).end("No such message");
      else
        res
          .writeHead(200, { "content-type": "text/html; charset=utf-8" })
          .end(message.html || `<pre>${escape(message.text)}</pre>`);
    } else if (url.pathname === "/") {
      res.writeHead(200, { "content-type": "text/html; charset=utf-8" }).end(inboxPage(messages));
    } else res.writeHead(404).end("Not found");
  });
  await new Promise<void>((resolve, reject) => {
    http.once("error", reject);
    http.listen(httpPort, "127.0.0.1", () => resolve());
  });

  // Port 0 asks the system for a free port: report the ones actually bound.
  const bound = (server: { address(): unknown }) => (server.address() as { port: number }).port;
  return {
    smtpPort: bound(smtp.server),
    httpPort: bound(http),
    messages,
    close: () =>
      Promise.all([
        new Promise<void>((r) => smtp.close(() => r())),
        new Promise<void>((r) => http.close(() => r())),
      ]).then(() => undefined),
  };
}
