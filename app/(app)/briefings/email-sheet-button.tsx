"use client";

import { useState } from "react";

export function EmailSheetButton({ revisionId }: { revisionId: string }) {
  const [state, setState] = useState<string | null>(null);
  const send = async () => {
    setState("Sending…");
    const res = await fetch(`/api/v1/revisions/${revisionId}/briefing-sheet/email`, { method: "POST" });
    const body = await res.json().catch(() => ({}));
    setState(res.ok && body.mail?.status === "sent" ? "Sent to your e-mail." : (body.error?.message ?? "Could not send: try again when the signal is better."));
  };
  return (
    <span className="flex items-center gap-2">
      <button type="button" onClick={send} className="rounded border border-rule bg-white px-4 py-3 font-bold">
        E-mail me the sheet
      </button>
      {state && (
        <span role="status" className="text-sm">
          {state}
        </span>
      )}
    </span>
  );
}
