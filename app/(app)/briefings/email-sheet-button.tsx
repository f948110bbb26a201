"use client";

import { useState } from "react";
import { apiRequest, messageOf } from "@/lib/api-client";

export function EmailSheetButton({ revisionId }: { revisionId: string }) {
  const [state, setState] = useState<string | null>(null);
  const send = async () => {
    setState("Sending…");
    try {
      const body = await apiRequest<{ mail?: { status: string } }>(
        `/api/v1/revisions/${revisionId}/briefing-sheet/email`,
        { method: "POST" },
      );
      setState(
        body.mail?.status === "sent" ? "Sent to your e-mail." : "Could not send: try again when the signal is better.",
      );
    } catch (err) {
      setState(messageOf(err));
    }
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
