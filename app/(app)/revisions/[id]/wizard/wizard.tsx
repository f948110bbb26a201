"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { FormProvider, useForm, useWatch, type Resolver } from "react-hook-form";
import { FormMessage, PrimaryButton } from "@/app/_components/form";
import { BandChip } from "@/app/_components/results/band";
import { SafetyCaution } from "@/app/_components/safety-caution";
import { contentSchema, type Content } from "@/assessments/method-statement/content";
import { reviewContent, type RegisterEntry, type ReviewItem } from "@/assessments/method-statement/score-task";
import { LoadsStep } from "./loads-step";
import { EmergencyStep, HazardsStep, PeopleStep, ScopeStep, SequenceStep } from "./steps";
import { STEPS, type StepKey } from "./steps-list";


type SaveState = { kind: "saved"; at: Date | null } | { kind: "dirty" } | { kind: "saving" } | { kind: "invalid" } | { kind: "conflict"; message: string } | { kind: "error"; message: string };

interface Props {
  revisionId: string;
  initialVersion: number;
  initialContent: Content;
  register: RegisterEntry[];
  approvers: { id: string; name: string }[];
  initialStep?: StepKey;
}

const AUTOSAVE_MS = 1200;

export function Wizard({ revisionId, initialVersion, initialContent, register, approvers, initialStep = "scope" }: Props) {
  const router = useRouter();
  const methods = useForm<Content>({ defaultValues: initialContent, resolver: zodResolver(contentSchema) as Resolver<Content>, mode: "onChange" });
  const { control, getValues, trigger, watch } = methods;
  const [step, setStep] = useState<StepKey>(initialStep);
  const [save, setSave] = useState<SaveState>({ kind: "saved", at: null });
  const version = useRef(initialVersion);
  const values = useWatch({ control });

  const saveNow = useCallback(async (): Promise<boolean> => {
    const parsed = contentSchema.safeParse(getValues());
    if (!parsed.success) {
      setSave({ kind: "invalid" });
      void trigger();
      return false;
    }
    setSave({ kind: "saving" });
    try {
      const res = await fetch(`/api/v1/revisions/${revisionId}`, {
        method: "PUT",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ version: version.current, content: parsed.data }),
      });
      const body = await res.json();
      if (res.status === 409) {
        setSave({ kind: "conflict", message: body.error?.message ?? "This draft was changed elsewhere." });
        return false;
      }
      if (!res.ok) {
        setSave({ kind: "error", message: body.error?.message ?? "The draft could not be saved." });
        return false;
      }
      version.current = body.version;
      setSave({ kind: "saved", at: new Date() });
      return true;
    } catch {
      setSave({ kind: "error", message: "No connection: your changes are kept here and saved when you continue." });
      return false;
    }
  }, [getValues, revisionId, trigger]);

  // Autosave a moment after the last change; never over a conflict (the user must decide).
  const conflicted = save.kind === "conflict";
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const subscription = watch(() => {
      if (conflicted) return;
      setSave({ kind: "dirty" });
      clearTimeout(timer);
      timer = setTimeout(() => void saveNow(), AUTOSAVE_MS);
    });
    return () => {
      clearTimeout(timer);
      subscription.unsubscribe();
    };
  }, [watch, saveNow, conflicted]);

  const review = useMemo(() => reviewContent(contentSchema.safeParse(values).success ? (values as Content) : getValues(), register), [values, register, getValues]);

  const go = (key: StepKey) => {
    setStep(key);
    window.scrollTo({ top: 0 });
  };

  return (
    <FormProvider {...methods}>
      <div className="space-y-4">
        <nav aria-label="Steps" className="flex flex-wrap gap-1">
          {STEPS.map((s, i) => (
            <button
              key={s.key}
              type="button"
              onClick={() => go(s.key)}
              aria-current={step === s.key ? "step" : undefined}
              className={`rounded-full border px-3 py-1.5 text-sm font-bold ${step === s.key ? "border-frame bg-frame text-frame-ink" : "border-rule bg-white hover:border-accent"}`}
            >
              <span className="tabular-nums">{i + 1}</span> {s.label}
              {review.missing.some((m) => m.step === s.key) && <span className="ml-1 text-band-act" aria-label="needs attention">•</span>}
            </button>
          ))}
        </nav>
        <SaveStatus state={save} onReload={() => router.refresh()} />
        <section aria-labelledby="step-heading" className="rounded-lg border border-rule bg-white p-4">
          <h2 id="step-heading" className="mb-3 text-xl font-bold">
            {STEPS.find((s) => s.key === step)!.label}
          </h2>
          <form noValidate onSubmit={(e) => e.preventDefault()}>
            {step === "scope" && <ScopeStep />}
            {step === "sequence" && <SequenceStep />}
            {step === "loads" && <LoadsStep register={register} revisionId={revisionId} />}
            {step === "hazards" && <HazardsStep />}
            {step === "people" && <PeopleStep />}
            {step === "emergency" && <EmergencyStep />}
          </form>
          {step === "review" && <ReviewStep revisionId={revisionId} missing={review.missing} worstBand={review.worstBand} approvers={approvers} saveNow={saveNow} version={version} goTo={go} />}
        </section>
        <div className="flex justify-between">
          <button type="button" className="font-bold text-accent underline disabled:opacity-40" disabled={step === STEPS[0].key} onClick={() => go(STEPS[STEPS.findIndex((s) => s.key === step) - 1].key)}>
            ← Back
          </button>
          {step !== "review" && (
            <PrimaryButton type="button" onClick={() => go(STEPS[STEPS.findIndex((s) => s.key === step) + 1].key)}>
              Next: {STEPS[STEPS.findIndex((s) => s.key === step) + 1].label}
            </PrimaryButton>
          )}
        </div>
      </div>
    </FormProvider>
  );
}

function SaveStatus({ state, onReload }: { state: SaveState; onReload: () => void }) {
  switch (state.kind) {
    case "saved":
      return <p className="text-sm text-muted" role="status">{state.at ? `All changes saved at ${state.at.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit" })}.` : "Draft opened. Changes save automatically."}</p>;
    case "dirty":
    case "saving":
      return <p className="text-sm text-muted" role="status">Saving…</p>;
    case "invalid":
      return <FormMessage tone="error">Not saved yet: some fields need attention (marked in red).</FormMessage>;
    case "error":
      return <FormMessage tone="error">{state.message}</FormMessage>;
    case "conflict":
      return (
        <FormMessage tone="error">
          <strong>Not saved — this draft was changed elsewhere.</strong> {state.message}{" "}
          <button type="button" className="font-bold underline" onClick={onReload}>
            Load the latest version
          </button>{" "}
          (what you typed here is then replaced).
        </FormMessage>
      );
  }
}

function ReviewStep({
  revisionId,
  missing,
  worstBand,
  approvers,
  saveNow,
  version,
  goTo,
}: {
  revisionId: string;
  missing: ReviewItem[];
  worstBand: import("@/assessments/rules/types").Band | null;
  approvers: { id: string; name: string }[];
  saveNow: () => Promise<boolean>;
  version: React.RefObject<number>;
  goTo: (key: StepKey) => void;
}) {
  const router = useRouter();
  const [approverId, setApproverId] = useState(approvers[0]?.id ?? "");
  const [reviewDate, setReviewDate] = useState(() => new Date(Date.now() + 180 * 86_400_000).toISOString().slice(0, 10));
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string; items?: string[] } | null>(null);
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    setBusy(true);
    setOutcome(null);
    if (!(await saveNow())) {
      setBusy(false);
      setOutcome({ tone: "error", text: "Save the draft first: see the message above." });
      return;
    }
    const res = await fetch(`/api/v1/revisions/${revisionId}/submit`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ version: version.current, approverId, reviewDate }),
    });
    const body = await res.json();
    setBusy(false);
    if (res.ok) {
      // The page re-renders read-only; the notice says whether the approver was e-mailed.
      router.replace(`/revisions/${revisionId}?notice=${body.mail?.status === "failed" ? "mail-failed" : "submitted"}`);
      router.refresh();
      return;
    }
    setOutcome({ tone: "error", text: body.error?.message ?? "Could not submit.", items: body.error?.issues?.map((i: { message: string }) => i.message) });
  };

  return (
    <div className="space-y-4">
      <div className="flex items-center gap-3">
        <span className="font-bold">Worst band of the tasks:</span> <BandChip band={worstBand} large />
      </div>
      {missing.length > 0 ? (
        <div>
          <h3 className="font-bold">Still missing before it can be submitted</h3>
          <ul className="mt-1 space-y-1" data-testid="missing">
            {missing.map((m, i) => (
              <li key={i}>
                <button type="button" className="text-left text-accent underline" onClick={() => goTo(m.step)}>
                  {STEPS.find((s) => s.key === m.step)!.label}
                </button>
                : {m.message}
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <FormMessage tone="success">Nothing required is missing.</FormMessage>
      )}
      <fieldset className="grid max-w-xl gap-3 rounded border border-rule p-3 sm:grid-cols-2">
        <legend className="px-1 font-bold">Submit for approval</legend>
        <label className="text-sm font-bold">
          Approver
          <select className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5 font-normal" value={approverId} onChange={(e) => setApproverId(e.target.value)}>
            {approvers.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm font-bold">
          Review by
          <input type="date" className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5 font-normal" value={reviewDate} onChange={(e) => setReviewDate(e.target.value)} />
        </label>
        <PrimaryButton type="button" disabled={busy || missing.length > 0 || !approverId} onClick={submit} className="sm:col-span-2">
          {busy ? "Submitting…" : "Submit for approval"}
        </PrimaryButton>
      </fieldset>
      {outcome && (
        <FormMessage tone={outcome.tone}>
          {outcome.text}
          {outcome.items && (
            <ul className="list-disc pl-5">
              {outcome.items.map((t) => (
                <li key={t}>{t}</li>
              ))}
            </ul>
          )}
        </FormMessage>
      )}
      <SafetyCaution />
    </div>
  );
}
