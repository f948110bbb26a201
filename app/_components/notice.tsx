import { FormMessage } from "./form";

/** One-line notices carried in `?notice=` after an action that re-renders the page. */
const NOTICES: Record<string, { tone: "success" | "error"; text: string }> = {
  submitted: {
    tone: "success",
    text: "Submitted for approval. The approver has been e-mailed the link and the draft pack.",
  },
  approved: {
    tone: "success",
    text: "Approved and countersigned. The signed pack is issued and the author has been told.",
  },
  returned: { tone: "success", text: "Returned to the author with your comments; they have been e-mailed." },
  "mail-failed": {
    tone: "error",
    text: "Done, but the e-mail could not be sent after three tries. The change stands; tell the other person another way (see Sent e-mail).",
  },
};

export function Notice({ code }: { code?: string }) {
  const notice = code ? NOTICES[code] : undefined;
  return notice ? <FormMessage tone={notice.tone}>{notice.text}</FormMessage> : null;
}
