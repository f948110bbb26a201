"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { Controller, FormProvider, useForm, useWatch } from "react-hook-form";
import {
  controlClass,
  controlProps,
  FieldFrame,
  FormMessage,
  PrimaryButton,
  SelectField,
} from "@/app/_components/form";
import { UkDateInput } from "@/app/_components/uk-date-input";
import { ukDate } from "@/lib/dates";
import { BandChip } from "@/app/_components/results/band";
import { SafetyCaution } from "@/app/_components/safety-caution";
import type { Content } from "@/assessments/method-statement/content";
import {
  reviewContent,
  reviewOfInvalid,
  type RegisterEntry,
  type Review,
  type ReviewItem,
} from "@/assessments/method-statement/score-task";
import { reviewDateRange } from "@/assessments/revisions/review-date";
import type { SubmitFormInput } from "@/assessments/revisions/schemas";
import { lazyResolver, loadValidation, readyValidation, useValidation } from "./checks";
import { LoadsStep } from "./loads-step";
import { GroundStep, LineStep } from "./lineside-steps";
import { EmergencyStep, hazardLibraryQuery, HazardsStep, PeopleStep, ScopeStep, SequenceStep } from "./steps";
import { STEPS, type StepKey } from "./steps-list";
import { ApiError, apiRequest, applyFieldIssues, messageOf } from "@/lib/api-client";

type SaveState =
  | { kind: "saved"; at: Date | null }
  | { kind: "dirty" }
  | { kind: "saving" }
  | { kind: "invalid" }
  | { kind: "conflict"; message: string }
  | { kind: "error"; message: string };

interface Props {
  revisionId: string;
  initialVersion: number;
  initialContent: Content;
  register: RegisterEntry[];
  approvers: { id: string; name: string }[];
  /** The organisation's default review period: the submit step suggests a review date that far ahead. */
  reviewPeriodMonths: number;
  /** Whether the caller may copy hazards from the organisation's hazard library. */
  fromLibrary: boolean;
  /** The server's review of the draft as saved, shown until the first change. */
  saved: Review;
  initialStep?: StepKey;
}

const AUTOSAVE_MS = 1200;
const CHECKS_UNAVAILABLE =
  "Not saved: the form's checks could not be loaded. Check the connection; your changes are kept here.";
const contentResolver = lazyResolver<Content>((v) => v.contentResolver);
const submitResolver = lazyResolver<SubmitFormInput>((v) => v.submitResolver);

export function Wizard({
  revisionId,
  initialVersion,
  initialContent,
  register,
  approvers,
  reviewPeriodMonths,
  fromLibrary,
  saved,
  initialStep = "scope",
}: Props) {
  const router = useRouter();
  // Checkbox groups need an array to start from, or react-hook-form reads them as one checkbox.
  const defaultValues = useMemo(
    () => ({ ...initialContent, tasks: initialContent.tasks.map((t) => ({ ...t, conditions: t.conditions ?? [] })) }),
    [initialContent],
  );
  const methods = useForm<Content>({
    defaultValues,
    resolver: contentResolver,
    mode: "onChange",
  });
  const { control, getValues, trigger, watch } = methods;
  const [step, setStep] = useState<StepKey>(initialStep);
  const [save, setSave] = useState<SaveState>({ kind: "saved", at: null });
  // Until the first change the server's results stand; after it, they are worked out here.
  const [edited, setEdited] = useState(false);
  const validation = useValidation();
  const version = useRef(initialVersion);
  // The register entries known here grow as components are chosen: scoring on screen needs them.
  const [known, setKnown] = useState(register);
  const remember = useCallback(
    (entry: RegisterEntry) => setKnown((list) => (list.some((e) => e.id === entry.id) ? list : [...list, entry])),
    [],
  );
  const values = useWatch({ control });
  // The hazard library is asked for as the adviser heads for the hazards step (a pointer over, or
  // focus on, a way there), not while the page loads: the first view stays light on a phone.
  const queryClient = useQueryClient();
  const readyLibrary = (key: StepKey) => {
    if (key === "hazards" && fromLibrary) void queryClient.prefetchQuery(hazardLibraryQuery);
  };

  const saveNow = useCallback(async (): Promise<boolean> => {
    let parsed;
    try {
      parsed = (await loadValidation()).contentSchema.safeParse(getValues());
    } catch {
      setSave({ kind: "error", message: CHECKS_UNAVAILABLE });
      return false;
    }
    if (!parsed.success) {
      setSave({ kind: "invalid" });
      void trigger();
      return false;
    }
    setSave({ kind: "saving" });
    try {
      const body = await apiRequest<{ version: number }>(`/api/v1/revisions/${revisionId}`, {
        method: "PUT",
        json: { version: version.current, content: parsed.data },
      });
      version.current = body.version;
      setSave({ kind: "saved", at: new Date() });
      return true;
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) setSave({ kind: "conflict", message: err.message });
      else if (err instanceof ApiError && err.offline)
        setSave({ kind: "error", message: "No connection: your changes are kept here and saved when you continue." });
      else setSave({ kind: "error", message: messageOf(err) });
      return false;
    }
  }, [getValues, revisionId, trigger]);

  // Autosave a moment after the last change; never over a conflict (the user must decide).
  const conflicted = save.kind === "conflict";
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const subscription = watch(() => {
      setEdited(true);
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

  // null while a change waits for the schemas: no stale result is shown meanwhile.
  const review = useMemo(() => {
    if (!edited) return saved;
    if (!validation) return null;
    // A draft whose fields fail the schema is not judged at all: its half-typed values could score Clear.
    const parsed = validation.contentSchema.safeParse(values);
    return parsed.success ? reviewContent(parsed.data, known) : reviewOfInvalid(parsed.error.issues.map((i) => i.path));
  }, [edited, saved, validation, values, known]);

  // The step after this one; none after the review.
  const nextStep = STEPS[STEPS.findIndex((s) => s.key === step) + 1] as (typeof STEPS)[number] | undefined;

  const go = (key: StepKey) => {
    setStep(key);
    window.scrollTo({ top: 0 });
  };

  return (
    <FormProvider {...methods}>
      {/* The form's checks load as the adviser reaches for it, not while the page starts. */}
      <div className="space-y-4" onPointerDownCapture={readyValidation} onFocusCapture={readyValidation}>
        <nav aria-label="Steps" className="flex flex-wrap gap-1">
          {STEPS.map((s, i) => (
            <button
              key={s.key}
              type="button"
              onClick={() => go(s.key)}
              onPointerEnter={() => readyLibrary(s.key)}
              onFocus={() => readyLibrary(s.key)}
              aria-current={step === s.key ? "step" : undefined}
              className={`rounded-full border px-3 py-1.5 text-sm font-bold ${step === s.key ? "border-frame bg-frame text-frame-ink" : "border-rule bg-white hover:border-accent"}`}
            >
              <span className="tabular-nums">{i + 1}</span> {s.label}
              {review?.missing.some((m) => m.step === s.key) && (
                <span className="ml-1 text-band-act" aria-label="needs attention">
                  •
                </span>
              )}
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
            {step === "line" && <LineStep />}
            {step === "ground" && <GroundStep />}
            {step === "sequence" && <SequenceStep />}
            {step === "loads" && (
              <LoadsStep
                register={known}
                onChosen={remember}
                revisionId={revisionId}
                results={{ saved: edited ? null : saved.scores, validation }}
              />
            )}
            {step === "hazards" && <HazardsStep fromLibrary={fromLibrary} />}
            {step === "people" && <PeopleStep />}
            {step === "emergency" && <EmergencyStep />}
          </form>
          {step === "review" && (
            <ReviewStep
              revisionId={revisionId}
              missing={review?.missing ?? null}
              worstBand={review?.worstBand ?? null}
              approvers={approvers}
              reviewPeriodMonths={reviewPeriodMonths}
              saveNow={saveNow}
              version={version}
              goTo={go}
            />
          )}
        </section>
        <div className="flex justify-between">
          <button
            type="button"
            className="font-bold text-accent underline disabled:opacity-40"
            disabled={step === STEPS[0].key}
            onClick={() => go(STEPS[STEPS.findIndex((s) => s.key === step) - 1].key)}
          >
            ← Back
          </button>
          {nextStep && (
            <PrimaryButton
              type="button"
              onClick={() => go(nextStep.key)}
              onPointerEnter={() => readyLibrary(nextStep.key)}
              onFocus={() => readyLibrary(nextStep.key)}
            >
              Next: {nextStep.label}
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
      return (
        <p className="text-sm text-muted" role="status">
          {state.at
            ? `All changes saved at ${state.at.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit" })}.`
            : "Draft opened. Changes save automatically."}
        </p>
      );
    case "dirty":
    case "saving":
      return (
        <p className="text-sm text-muted" role="status">
          Saving…
        </p>
      );
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
  reviewPeriodMonths,
  saveNow,
  version,
  goTo,
}: {
  revisionId: string;
  /** null while a change waits for the schemas. */
  missing: ReviewItem[] | null;
  worstBand: import("@/assessments/rules/types").Band | null;
  approvers: { id: string; name: string }[];
  reviewPeriodMonths: number;
  saveNow: () => Promise<boolean>;
  version: React.RefObject<number>;
  goTo: (key: StepKey) => void;
}) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string; items?: string[] } | null>(null);
  // Fixed when the step opens: the accepted range, and the organisation's review period ahead as
  // the suggestion (kept within the range).
  const [dates] = useState(() => {
    const range = reviewDateRange();
    const ahead = new Date();
    ahead.setUTCMonth(ahead.getUTCMonth() + reviewPeriodMonths);
    const suggested = ahead.toISOString().slice(0, 10);
    return {
      ...range,
      suggested: suggested > range.latest ? range.latest : suggested < range.earliest ? range.earliest : suggested,
    };
  });
  const { register, control, handleSubmit, setError, formState } = useForm<SubmitFormInput>({
    resolver: submitResolver,
    defaultValues: { approverId: approvers[0]?.id ?? "", reviewDate: dates.suggested },
  });

  const submit = handleSubmit(async (values) => {
    setOutcome(null);
    if (!(await saveNow())) {
      setOutcome({ tone: "error", text: "Save the draft first: see the message above." });
      return;
    }
    try {
      const body = await apiRequest<{ mail?: { status: string } }>(`/api/v1/revisions/${revisionId}/submit`, {
        json: { ...values, version: version.current },
      });
      // The page re-renders read-only; the notice says whether the approver was e-mailed.
      router.replace(`/revisions/${revisionId}?notice=${body.mail?.status === "failed" ? "mail-failed" : "submitted"}`);
      router.refresh();
    } catch (err) {
      // Field problems go beside their field; anything else (what the draft still lacks) is listed.
      const rest = applyFieldIssues(err, setError, ["approverId", "reviewDate"]).map((i) => i.message);
      setOutcome({ tone: "error", text: messageOf(err), items: rest.length ? rest : undefined });
    }
  });

  return (
    <div className="space-y-4">
      <div className="flex items-center gap-3">
        <span className="font-bold">Worst band of the tasks:</span> <BandChip band={worstBand} large />
      </div>
      {missing === null ? (
        <p className="text-muted" role="status">
          Checking the draft…
        </p>
      ) : missing.length > 0 ? (
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
      <form noValidate onSubmit={submit}>
        <fieldset className="grid max-w-xl gap-3 rounded border border-rule p-3 sm:grid-cols-2">
          <legend className="px-1 font-bold">Submit for approval</legend>
          <SelectField label="Approver" error={formState.errors.approverId?.message} {...register("approverId")}>
            {approvers.length === 0 && <option value="">No approver in your organisation</option>}
            {approvers.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </SelectField>
          <FieldFrame
            id="field-reviewDate"
            label="Review by"
            hint={`Day-month-year, from ${ukDate(dates.earliest)} to ${ukDate(dates.latest)}`}
            error={formState.errors.reviewDate?.message}
          >
            <Controller
              control={control}
              name="reviewDate"
              render={({ field }) => (
                <UkDateInput
                  {...controlProps("field-reviewDate", formState.errors.reviewDate?.message)}
                  className={controlClass(formState.errors.reviewDate?.message)}
                  {...field}
                />
              )}
            />
          </FieldFrame>
          <PrimaryButton
            type="submit"
            disabled={formState.isSubmitting || missing === null || missing.length > 0 || approvers.length === 0}
            className="sm:col-span-2"
          >
            {formState.isSubmitting ? "Submitting…" : "Submit for approval"}
          </PrimaryButton>
        </fieldset>
      </form>
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
