"use client";

import * as Dialog from "@radix-ui/react-dialog";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { FormMessage, PrimaryButton, SecondaryButton, TextField } from "@/app/_components/form";
import { SignatureField, type SignatureFieldHandle } from "@/app/_components/signature-field";
import { STEP_KEYS } from "@/assessments/revisions/schemas";
import { ApiError, apiRequest, messageOf } from "@/lib/api-client";

const SECTION_LABELS: Record<(typeof STEP_KEYS)[number], string> = {
  scope: "Scope",
  sequence: "Sequence of work",
  loads: "Loads & lifts",
  hazards: "Hazards & controls",
  people: "People, plant & PPE",
  emergency: "Emergency & environment",
};

type Issues = Record<string, string>;

export function ReviewActions({
  revisionId,
  version,
  contentHash,
  secondFactor,
  defaultName,
}: {
  revisionId: string;
  version: number;
  /** The fingerprint of the content on this page: the approval is bound to it. */
  contentHash: string;
  /** The approver has an authenticator app: the confirmation asks for a code too. */
  secondFactor: boolean;
  defaultName: string;
}) {
  const router = useRouter();
  const signature = useRef<SignatureFieldHandle>(null);
  const [name, setName] = useState(defaultName);
  const [role, setRole] = useState("");
  const [issues, setIssues] = useState<Issues>({});
  const [confirmOpen, setConfirmOpen] = useState(false);
  const [password, setPassword] = useState("");
  const [code, setCode] = useState("");
  const [stepUpIssues, setStepUpIssues] = useState<Issues>({});
  const [drawn, setDrawn] = useState<string | null>(null);
  const [comments, setComments] = useState<Record<string, string>>({});
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  /** The answer, or the refusal shown beside the form (with its field issues on their fields). */
  const post = async (path: string, body: unknown): Promise<{ mail?: { status: string } } | null> => {
    setBusy(true);
    setOutcome(null);
    try {
      return await apiRequest<{ mail?: { status: string } }>(`/api/v1/revisions/${revisionId}/${path}`, { json: body });
    } catch (err) {
      const issues = err instanceof ApiError ? err.issues : [];
      setIssues(Object.fromEntries(issues.map((i) => [i.path, i.message])));
      setOutcome({ tone: "error", text: issues.find((i) => i.path.startsWith("comments"))?.message ?? messageOf(err) });
      return null;
    } finally {
      setBusy(false);
    }
  };

  const askToSign = () => {
    const image = signature.current?.toDataUrl() ?? null;
    const found: Issues = {};
    if (name.trim().length < 2) found.name = "Type your name";
    if (role.trim().length < 2) found.role = "Type your role";
    if (!image) found.signature = "Draw your signature";
    setIssues(found);
    if (Object.keys(found).length) return;
    setDrawn(image);
    setConfirmOpen(true);
  };

  const countersign = async () => {
    const found: Issues = {};
    if (!password) found.password = "Enter your password to confirm it is you";
    if (secondFactor && !code.trim()) found.code = "Enter the code from your authenticator app";
    setStepUpIssues(found);
    if (Object.keys(found).length) return;
    setBusy(true);
    try {
      const answer = await apiRequest<{ mail?: { status: string } }>(`/api/v1/revisions/${revisionId}/approve`, {
        json: { version, contentHash, name, role, signature: drawn, password, code: code || undefined },
      });
      setConfirmOpen(false);
      router.replace(`/reviews/${revisionId}?notice=${answer.mail?.status === "failed" ? "mail-failed" : "approved"}`);
      router.refresh();
    } catch (err) {
      // Step-up refusals stay in the dialog, on their fields; anything else closes it and shows beside the form.
      const issues = err instanceof ApiError ? err.issues : [];
      const onDialog = issues.filter((i) => i.path === "password" || i.path === "code");
      if (onDialog.length || (err instanceof ApiError && err.status === 429)) {
        setStepUpIssues(Object.fromEntries(onDialog.map((i) => [i.path, i.message])));
        if (!onDialog.length) setStepUpIssues({ password: messageOf(err) });
        setPassword("");
        setCode("");
        return;
      }
      setConfirmOpen(false);
      setIssues(Object.fromEntries(issues.map((i) => [i.path, i.message])));
      setOutcome({ tone: "error", text: messageOf(err) });
    } finally {
      setBusy(false);
    }
  };

  const sendBack = async () => {
    const answer = await post("return", { version, comments });
    if (answer) {
      router.replace(`/reviews/${revisionId}?notice=${answer.mail?.status === "failed" ? "mail-failed" : "returned"}`);
      router.refresh();
    }
  };

  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <section
        aria-labelledby="countersign-heading"
        className="space-y-3 rounded-lg border-2 border-accent bg-white p-4"
      >
        <h2 id="countersign-heading" className="text-xl font-bold">
          Countersign
        </h2>
        <p className="text-sm text-muted">
          Your signature approves this revision. It is then locked, and a digitally signed pack is issued.
        </p>
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Your name"
            name="signer-name"
            value={name}
            onChange={(e) => setName(e.target.value)}
            error={issues.name}
          />
          <TextField
            label="Your role"
            name="signer-role"
            placeholder="e.g. Contracts manager"
            value={role}
            onChange={(e) => setRole(e.target.value)}
            error={issues.role}
          />
        </div>
        <SignatureField ref={signature} label="Sign here" error={issues.signature} />
        <PrimaryButton type="button" disabled={busy} onClick={askToSign}>
          Countersign and approve…
        </PrimaryButton>
        <Dialog.Root open={confirmOpen} onOpenChange={setConfirmOpen}>
          <Dialog.Portal>
            <Dialog.Overlay className="fixed inset-0 bg-black/40" />
            <Dialog.Content className="fixed left-1/2 top-1/2 w-[min(92vw,30rem)] -translate-x-1/2 -translate-y-1/2 rounded-lg bg-paper p-6 shadow-xl">
              <Dialog.Title className="text-lg font-bold">Approve this revision?</Dialog.Title>
              <Dialog.Description className="mt-2 text-sm text-muted">
                You, {name} ({role}), approve it for use on site. It is locked and a signed pack is issued; changes then
                need a new revision.
              </Dialog.Description>
              {drawn && (
                // eslint-disable-next-line @next/next/no-img-element -- a data URL of the drawing just made
                <img src={drawn} alt="Your signature" className="mt-3 h-20 rounded border border-rule bg-white" />
              )}
              <form
                className="mt-4 space-y-3"
                onSubmit={(e) => {
                  e.preventDefault();
                  void countersign();
                }}
              >
                <p className="text-sm">
                  Confirm it is you: a signature is accepted only with your password
                  {secondFactor ? " and a code from your authenticator app" : ""}, so an open session cannot sign.
                </p>
                <TextField
                  label="Your password"
                  type="password"
                  autoComplete="current-password"
                  value={password}
                  onChange={(e) => setPassword(e.target.value)}
                  error={stepUpIssues.password}
                />
                {secondFactor && (
                  <TextField
                    label="Code from your authenticator app"
                    hint="Six digits, or one of your recovery codes."
                    autoComplete="one-time-code"
                    value={code}
                    onChange={(e) => setCode(e.target.value)}
                    error={stepUpIssues.code}
                  />
                )}
                <p className="break-all text-xs text-muted">Content fingerprint (SHA-256): {contentHash}</p>
                <div className="flex justify-end gap-2">
                  <Dialog.Close asChild>
                    <SecondaryButton type="button">Not yet</SecondaryButton>
                  </Dialog.Close>
                  <PrimaryButton type="submit" disabled={busy}>
                    {busy ? "Signing…" : "Approve and sign"}
                  </PrimaryButton>
                </div>
              </form>
            </Dialog.Content>
          </Dialog.Portal>
        </Dialog.Root>
      </section>
      <section aria-labelledby="return-heading" className="space-y-3 rounded-lg border border-rule bg-white p-4">
        <h2 id="return-heading" className="text-xl font-bold">
          Return with comments
        </h2>
        <p className="text-sm text-muted">
          Comment on the sections that need changing. The author gets it back as a draft.
        </p>
        {STEP_KEYS.map((key) => (
          <label key={key} className="block text-sm font-bold">
            {SECTION_LABELS[key]}
            <textarea
              rows={2}
              value={comments[key] ?? ""}
              onChange={(e) => setComments({ ...comments, [key]: e.target.value })}
              className="mt-1 block w-full rounded border border-rule px-2 py-1.5 font-normal"
            />
          </label>
        ))}
        <SecondaryButton type="button" disabled={busy} onClick={sendBack}>
          Return to the author
        </SecondaryButton>
      </section>
      {outcome && (
        <div className="lg:col-span-2">
          <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>
        </div>
      )}
    </div>
  );
}
