"use client";

import { useState } from "react";
import { FormMessage, PrimaryButton } from "@/app/_components/form";
import { apiRequest, messageOf } from "@/lib/api-client";

type Answer =
  | {
      result: "authentic";
      status: string;
      title: string;
      revision: number;
      organisation: string;
      approvedAt: string | null;
      kind: string;
    }
  | { result: "altered"; status: string; title: string; revision: number; organisation: string }
  | { result: "unknown" };

const STATUS: Record<string, string> = {
  approved: "approved and current",
  superseded: "approved, but superseded by a later revision — do not work to it",
  submitted: "submitted, not yet approved — do not work to it",
  draft: "a draft — do not work to it",
};

export function VerifyForm() {
  const [file, setFile] = useState<File | null>(null);
  const [answer, setAnswer] = useState<Answer | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const check = async () => {
    setAnswer(null);
    setProblem(null);
    if (!file) return setProblem("Choose a PDF first.");
    setBusy(true);
    const form = new FormData();
    form.set("file", file);
    try {
      setAnswer(await apiRequest<Answer>("/api/verify", { body: form }));
    } catch (err) {
      setProblem(messageOf(err));
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="space-y-4">
      <label className="block font-bold">
        Pack (PDF, at most 20 MB)
        <input
          type="file"
          accept="application/pdf"
          className="mt-2 block font-normal"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        />
      </label>
      <PrimaryButton type="button" disabled={busy} onClick={check} className="w-full py-3">
        {busy ? "Checking…" : "Check"}
      </PrimaryButton>
      {problem && <FormMessage tone="error">{problem}</FormMessage>}
      {answer && (
        <div data-testid="verify-answer" data-result={answer.result}>
          {answer.result === "authentic" && (
            <FormMessage tone={answer.status === "approved" && answer.kind === "approved" ? "success" : "error"}>
              <strong>Unaltered.</strong> This is the pack Heftwise issued for “{answer.title}”, revision{" "}
              {answer.revision}, of {answer.organisation}. That revision is {STATUS[answer.status] ?? answer.status}
              {answer.kind === "draft" ? " This copy is the draft sent for approval, not the signed pack." : "."}
            </FormMessage>
          )}
          {answer.result === "altered" && (
            <FormMessage tone="error">
              <strong>Altered.</strong> This file names “{answer.title}”, revision {answer.revision}, of{" "}
              {answer.organisation}, but it is not the pack Heftwise issued: it has been changed. Do not work to it; get
              the approved pack from the organisation.
            </FormMessage>
          )}
          {answer.result === "unknown" && (
            <FormMessage tone="error">
              <strong>Unknown.</strong> Heftwise did not issue this file. It may be another document, or a pack changed
              beyond recognition.
            </FormMessage>
          )}
        </div>
      )}
      <p className="text-xs text-muted">
        Heftwise supports, and does not replace, the judgement of a competent person. Follow local regulations, your
        organisation&apos;s procedures and licensed practice.
      </p>
    </div>
  );
}
