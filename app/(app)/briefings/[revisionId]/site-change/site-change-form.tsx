"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormMessage } from "@/app/_components/form";
import { ApiError, apiRequest, problemOf } from "@/lib/api-client";

export function SiteChangeForm({ revisionId }: { revisionId: string }) {
  const router = useRouter();
  const [text, setText] = useState("");
  const [photo, setPhoto] = useState<File | null>(null);
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    setOutcome(null);
    if (text.trim().length < 10)
      return setOutcome({ tone: "error", text: "Describe what is different (at least 10 characters)." });
    setBusy(true);
    const form = new FormData();
    form.set("revisionId", revisionId);
    form.set("text", text);
    if (photo) form.set("photo", photo);
    let body: { mail?: { status: string } };
    try {
      body = await apiRequest("/api/v1/site-changes", { body: form });
    } catch (err) {
      return setOutcome({
        tone: "error",
        text:
          err instanceof ApiError && err.offline
            ? "No signal: nothing was sent. Try again when you have signal."
            : problemOf(err),
      });
    } finally {
      setBusy(false);
    }
    setOutcome({
      tone: "success",
      text:
        body.mail?.status === "sent"
          ? "Recorded, and the safety adviser has been e-mailed."
          : "Recorded. The e-mail to the safety adviser failed: tell them by phone.",
    });
    setText("");
    router.refresh();
  };

  return (
    <div className="space-y-4 rounded-lg border border-rule bg-white p-4 text-lg">
      <label className="block font-bold">
        What is different?
        <textarea
          value={text}
          onChange={(e) => setText(e.target.value)}
          rows={5}
          placeholder="e.g. Access point moved to the north gate: carry distance now 60 m."
          className="mt-1 block w-full rounded border-2 border-rule px-3 py-2 font-normal"
        />
      </label>
      <label className="block font-bold">
        Photo (optional)
        <input
          type="file"
          accept="image/jpeg,image/png,image/webp"
          capture="environment"
          onChange={(e) => setPhoto(e.target.files?.[0] ?? null)}
          className="mt-1 block font-normal"
        />
      </label>
      <button
        type="button"
        disabled={busy}
        onClick={submit}
        className="min-h-14 w-full rounded-lg bg-band-act px-5 py-3 text-xl font-bold text-white disabled:opacity-60"
      >
        {busy ? "Sending…" : "Send the site change"}
      </button>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
    </div>
  );
}
