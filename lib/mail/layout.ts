/** The frame of every Heftwise e-mail, in HTML and plain text. */
const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

export interface MailBody {
  heading: string;
  paragraphs: string[];
  action?: { label: string; url: string };
  footnote?: string;
}

export function renderMail(body: MailBody): { text: string; html: string } {
  const text = [
    body.heading,
    "",
    ...body.paragraphs.flatMap((p) => [p, ""]),
    ...(body.action ? [`${body.action.label}: ${body.action.url}`, ""] : []),
    ...(body.footnote ? [body.footnote, ""] : []),
    "— Heftwise",
  ].join("\n");
  const html = `<!doctype html><html><body style="margin:0;background:#eef1ee;font-family:Arial,Helvetica,sans-serif;color:#17201c">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:24px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" style="background:#ffffff;border-radius:6px;overflow:hidden">
<tr><td style="background:#16302b;color:#f3efe4;padding:14px 24px;font-size:18px;font-weight:bold;letter-spacing:.5px">Heftwise</td></tr>
<tr><td style="padding:24px">
<h1 style="font-size:20px;margin:0 0 16px">${escape(body.heading)}</h1>
${body.paragraphs.map((p) => `<p style="font-size:15px;line-height:1.5;margin:0 0 12px">${escape(p)}</p>`).join("\n")}
${body.action ? `<p style="margin:20px 0"><a href="${escape(body.action.url)}" style="background:#0f766e;color:#ffffff;padding:12px 18px;border-radius:4px;text-decoration:none;font-weight:bold">${escape(body.action.label)}</a></p><p style="font-size:12px;color:#4b5a54">Or paste this link into your browser: ${escape(body.action.url)}</p>` : ""}
${body.footnote ? `<p style="font-size:12px;color:#4b5a54;margin-top:20px">${escape(body.footnote)}</p>` : ""}
</td></tr></table></td></tr></table></body></html>`;
  return { text, html };
}
