"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { FormMessage, PrimaryButton, SecondaryButton } from "@/app/_components/form";
import { apiRequest, messageOf } from "@/lib/api-client";

interface Attachment {
  id: string;
  filename: string;
  contentType: string;
  size: number;
  createdAt: string;
}

const kb = (n: number) => (n < 1024 * 1024 ? `${Math.ceil(n / 1024)} KB` : `${(n / 1024 / 1024).toFixed(1)} MB`);

export function Attachments({
  componentId,
  attachments,
  editable,
}: {
  componentId: string;
  attachments: Attachment[];
  editable: boolean;
}) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);

  const upload = async () => {
    const file = input.current?.files?.[0];
    if (!file) {
      setOutcome({ tone: "error", text: "Choose a file first." });
      return;
    }
    setBusy(true);
    setOutcome(null);
    const form = new FormData();
    form.set("file", file);
    try {
      await apiRequest(`/api/v1/components/${componentId}/attachments`, { body: form });
      setOutcome({ tone: "success", text: `${file.name} attached.` });
      if (input.current) input.current.value = "";
      router.refresh();
    } catch (err) {
      setOutcome({ tone: "error", text: messageOf(err) });
    } finally {
      setBusy(false);
    }
  };

  const remove = async (id: string) => {
    try {
      await apiRequest(`/api/v1/attachments/${id}`, { method: "DELETE" });
      router.refresh();
    } catch (err) {
      setOutcome({ tone: "error", text: `The attachment could not be removed: ${messageOf(err)}` });
    }
  };

  return (
    <section aria-labelledby="attachments-heading" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h2 id="attachments-heading" className="text-lg font-bold">
        Data sheets and photographs
      </h2>
      {attachments.length === 0 ? (
        <p className="text-muted">Nothing attached yet.</p>
      ) : (
        <ul className="divide-y divide-rule">
          {attachments.map((a) => (
            <li key={a.id} className="flex items-center justify-between gap-2 py-2">
              <a href={`/api/v1/attachments/${a.id}`} className="font-bold text-accent underline">
                {a.filename}
              </a>
              <span className="text-sm text-muted">
                {a.contentType === "application/pdf" ? "PDF" : "Photograph"} · {kb(a.size)}
              </span>
              {editable && (
                <SecondaryButton type="button" onClick={() => remove(a.id)}>
                  Remove
                </SecondaryButton>
              )}
            </li>
          ))}
        </ul>
      )}
      {editable && (
        <div className="flex flex-wrap items-end gap-3">
          <label className="text-sm font-bold">
            Attach a PDF data sheet or a photograph (at most 10 MB)
            <input
              ref={input}
              type="file"
              accept="application/pdf,image/jpeg,image/png,image/webp"
              className="mt-1 block font-normal"
            />
          </label>
          <PrimaryButton type="button" disabled={busy} onClick={upload}>
            {busy ? "Uploading…" : "Attach"}
          </PrimaryButton>
        </div>
      )}
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
    </section>
  );
}
