"use client";

import Link from "next/link";
import { useCallback, useEffect, useRef, useState } from "react";
import { BandChip } from "@/app/_components/results/band";
import { SignatureField, type SignatureFieldHandle } from "@/app/_components/signature-field";
import type { BriefingScript } from "@/assessments/briefing/instructions";
import { LINE_CAUTION } from "@/assessments/method-statement/lineside";
import { flush, loadQueue, newKey, saveQueue, type PendingSignOn } from "./sign-on-queue";
import { ApiError, apiRequest, problemOf } from "@/lib/api-client";

interface Props {
  revisionId: string;
  title: string;
  revisionNumber: number;
  job: { name: string; accessPoint: string | null; siteContactName: string | null; siteContactPhone: string | null };
  script: BriefingScript;
  siteChanges: { text: string; by: string; at: string }[];
  foremanName: string;
}

type Screen =
  | { kind: "start" }
  | { kind: "line" }
  | { kind: "sequence" }
  | { kind: "load"; index: number }
  | { kind: "hazards" }
  | { kind: "ppe" }
  | { kind: "emergency" }
  | { kind: "sign-on" }
  | { kind: "sign-off" }
  | { kind: "done" };

const big = "min-h-14 rounded-lg px-5 py-3 text-xl font-bold";

export function BriefingMode({ revisionId, title, revisionNumber, job, script, siteChanges, foremanName }: Props) {
  const screens: Screen[] = [
    ...(script.line ? [{ kind: "line" } as Screen] : []),
    { kind: "sequence" },
    ...script.loads.map((_, index) => ({ kind: "load", index }) as Screen),
    { kind: "hazards" },
    { kind: "ppe" },
    { kind: "emergency" },
    { kind: "sign-on" },
    { kind: "sign-off" },
  ];
  const [position, setPosition] = useState(-1);
  const [briefingId, setBriefingId] = useState<string | null>(null);
  const [place, setPlace] = useState(job.accessPoint ?? "");
  const [problem, setProblem] = useState<string | null>(null);
  const [queue, setQueue] = useState<PendingSignOn[]>([]);
  const [online, setOnline] = useState(true);
  const [done, setDone] = useState(false);
  const flushing = useRef(false);
  const screen: Screen = done ? { kind: "done" } : position < 0 ? { kind: "start" } : screens[position];

  const send = useCallback(async () => {
    if (!briefingId || flushing.current) return;
    flushing.current = true;
    try {
      setQueue(await flush(briefingId, loadQueue(briefingId)));
    } finally {
      flushing.current = false;
    }
  }, [briefingId]);

  useEffect(() => {
    const update = () => {
      setOnline(navigator.onLine);
      if (navigator.onLine) void send();
    };
    window.addEventListener("online", update);
    window.addEventListener("offline", update);
    const timer = setInterval(() => void send(), 5000);
    return () => {
      window.removeEventListener("online", update);
      window.removeEventListener("offline", update);
      clearInterval(timer);
    };
  }, [send]);

  const start = async () => {
    setProblem(null);
    let body: { briefingId: string };
    try {
      body = await apiRequest("/api/v1/briefings", { json: { revisionId, place } });
    } catch (err) {
      setProblem(
        err instanceof ApiError && err.offline
          ? "No connection: the briefing needs signal to start. Sign-ons later can wait for signal."
          : problemOf(err),
      );
      return;
    }
    setBriefingId(body.briefingId);
    setQueue(loadQueue(body.briefingId));
    setPosition(0);
  };

  const waiting = queue.filter((q) => q.state === "waiting").length;
  const sent = queue.filter((q) => q.state === "sent").length;

  return (
    <div className="mx-auto max-w-2xl space-y-5 text-lg" data-testid="briefing-mode">
      <header className="space-y-1">
        <p className="text-base text-muted">
          {job.name} · revision {revisionNumber}
        </p>
        <h1 className="text-2xl font-bold">{title}</h1>
        {briefingId && (
          <p
            role="status"
            className={`rounded px-3 py-2 text-base font-bold ${waiting ? "bg-band-watch text-white" : "bg-teal-50"}`}
            data-testid="sign-on-status"
          >
            {online ? "Online" : "No signal"} · {sent} signed on{waiting ? ` · ${waiting} waiting to send` : ""}
          </p>
        )}
      </header>

      {siteChanges.length > 0 && screen.kind !== "done" && (
        <section role="alert" className="rounded-lg border-4 border-band-act bg-white p-4">
          <h2 className="text-xl font-bold text-band-act">Site change reported</h2>
          {siteChanges.map((c, i) => (
            <p key={i}>
              {c.text} <span className="text-base text-muted">— {c.by}</span>
            </p>
          ))}
          <p className="text-base">
            The assessment may no longer match the site. Check with the safety adviser before work.
          </p>
        </section>
      )}

      <main className="min-h-64 rounded-lg border-2 border-frame bg-white p-5">
        {screen.kind === "start" && (
          <div className="space-y-4">
            <h2 className="text-2xl font-bold">Start the briefing</h2>
            <label className="block font-bold">
              Where are you briefing?
              <input
                value={place}
                onChange={(e) => setPlace(e.target.value)}
                className="mt-2 block w-full rounded border-2 border-rule px-3 py-3 text-xl font-normal"
              />
            </label>
            {problem && (
              <p role="alert" className="font-bold text-danger">
                {problem}
              </p>
            )}
            <button type="button" onClick={start} className={`${big} w-full bg-accent text-white`}>
              Start
            </button>
          </div>
        )}
        {screen.kind === "line" && script.line && <LineScreen line={script.line} />}
        {screen.kind === "sequence" && (
          <div>
            <h2 className="mb-3 text-2xl font-bold">The job, step by step</h2>
            <ol className="list-decimal space-y-2 pl-7 text-xl">
              {script.sequence.map((s, i) => (
                <li key={i}>{s}</li>
              ))}
            </ol>
          </div>
        )}
        {screen.kind === "load" && (
          <LoadScreen load={script.loads[screen.index]} number={screen.index + 1} of={script.loads.length} />
        )}
        {screen.kind === "hazards" && (
          <div>
            <h2 className="mb-3 text-2xl font-bold">Hazards and what we do about them</h2>
            {script.hazards.map((h, i) => (
              <div key={i} className="mb-4">
                <h3 className="text-xl font-bold">{h.hazard}</h3>
                <ul className="list-disc pl-7 text-xl">
                  {h.controls.map((c, j) => (
                    <li key={j}>{c}</li>
                  ))}
                </ul>
              </div>
            ))}
          </div>
        )}
        {screen.kind === "ppe" && (
          <div>
            <h2 className="mb-3 text-2xl font-bold">Wear</h2>
            <ul className="list-disc space-y-1 pl-7 text-xl">
              {script.ppe.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </div>
        )}
        {screen.kind === "emergency" && (
          <div className="space-y-3 text-xl">
            <h2 className="text-2xl font-bold">If someone is hurt</h2>
            <p>
              <strong>Nearest hospital with an emergency department:</strong> {script.emergency.nearestHospital || "—"}
            </p>
            <p>{script.emergency.arrangements}</p>
            {job.siteContactName && (
              <p>
                <strong>Site contact:</strong> {job.siteContactName}{" "}
                {job.siteContactPhone && (
                  <a
                    href={`tel:${job.siteContactPhone.replace(/\s/g, "")}`}
                    className="font-bold text-accent underline"
                  >
                    {job.siteContactPhone}
                  </a>
                )}
              </p>
            )}
          </div>
        )}
        {screen.kind === "sign-on" && briefingId && (
          <SignOn briefingId={briefingId} queue={queue} setQueue={setQueue} send={send} />
        )}
        {screen.kind === "sign-off" && briefingId && (
          <SignOff
            briefingId={briefingId}
            foremanName={foremanName}
            waiting={waiting}
            sent={sent}
            onDone={() => setDone(true)}
          />
        )}
        {screen.kind === "done" && briefingId && (
          <div className="space-y-3">
            <h2 className="text-2xl font-bold">Briefing recorded</h2>
            <p>
              {sent} operative{sent === 1 ? "" : "s"} signed on, and you signed it off.
            </p>
            <Link href={`/briefings/record/${briefingId}`} className={`${big} block bg-accent text-center text-white`}>
              See the briefing record
            </Link>
          </div>
        )}
      </main>

      {screen.kind !== "start" && screen.kind !== "done" && (
        <nav className="flex justify-between gap-3" aria-label="Briefing steps">
          <button
            type="button"
            disabled={position === 0}
            onClick={() => setPosition(position - 1)}
            className={`${big} border-2 border-rule bg-white disabled:opacity-40`}
          >
            Back
          </button>
          <span className="self-center text-base text-muted">
            {position + 1} of {screens.length}
          </span>
          {position < screens.length - 1 && (
            <button
              type="button"
              onClick={() => setPosition(position + 1)}
              className={`${big} bg-frame text-frame-ink`}
            >
              Next
            </button>
          )}
        </nav>
      )}
    </div>
  );
}

/** First of all: how the gang is kept safe from trains, where to stand clear, and the permits. */
function LineScreen({ line }: { line: NonNullable<BriefingScript["line"]> }) {
  return (
    <div className="space-y-4 text-xl" data-testid="line-screen">
      <h2 className="text-2xl font-bold">Safe from trains</h2>
      <p className="text-base text-muted">{line.where}</p>
      {line.protection && (
        <div className="rounded-lg border-4 border-frame p-3">
          <p className="text-2xl font-bold">{line.protection}</p>
          {line.protectionDetail && <p>{line.protectionDetail}</p>}
          {line.responsible && (
            <p className="mt-2">
              <strong>Responsible:</strong> {line.responsible}
            </p>
          )}
        </div>
      )}
      {line.positionsOfSafety && (
        <div>
          <h3 className="font-bold">Positions of safety</h3>
          <p className="text-2xl">{line.positionsOfSafety}</p>
        </div>
      )}
      {line.limits && (
        <div>
          <h3 className="font-bold">Keep to these limits</h3>
          <p>{line.limits}</p>
        </div>
      )}
      {(line.accessPoint || line.walkingRoute) && (
        <p>
          <strong>Access:</strong> {[line.accessPoint, line.walkingRoute].filter(Boolean).join(" — ")}
        </p>
      )}
      {line.permits.length > 0 && (
        <div>
          <h3 className="font-bold">Permits</h3>
          <ul className="space-y-1">
            {line.permits.map((p, i) => (
              <li key={i}>
                <strong>{p.name}</strong>{" "}
                <span className="font-bold tabular-nums">{p.reference || "— no reference"}</span>
                {p.issuedBy && <span className="text-base text-muted"> · issued by {p.issuedBy}</span>}
                {p.valid && <span className="text-base text-muted"> · valid {p.valid}</span>}
              </li>
            ))}
          </ul>
        </div>
      )}
      {line.digging.length > 0 && (
        <div>
          <h3 className="font-bold">Digging</h3>
          <ul className="list-disc space-y-1 pl-7">
            {line.digging.map((d, i) => (
              <li key={i}>{d}</li>
            ))}
          </ul>
        </div>
      )}
      <p className="text-base text-muted">{LINE_CAUTION}</p>
    </div>
  );
}

function LoadScreen({ load, number, of }: { load: BriefingScript["loads"][number]; number: number; of: number }) {
  return (
    <div className="space-y-3">
      <p className="text-base text-muted">
        Load {number} of {of}
      </p>
      <h2 className="text-2xl font-bold">{load.title}</h2>
      <div className="flex flex-wrap items-center gap-3">
        <BandChip band={load.band} large />
        <span className="text-xl">{load.component}</span>
      </div>
      <ul className="list-disc space-y-2 pl-7 text-xl">
        {load.lines.map((l, i) => (
          <li key={i} className={l.startsWith("STOP") ? "font-bold text-band-act" : ""}>
            {l}
          </li>
        ))}
      </ul>
      {load.lift && (
        <div className="rounded border-2 border-band-watch p-3 text-xl">
          {load.lift.exclusionZoneM !== null && (
            <p className="font-bold">Exclusion zone: {load.lift.exclusionZoneM} m</p>
          )}
          <ul>
            {load.lift.roles.map((r) => (
              <li key={r.role}>
                {r.role}: <strong>{r.name || "—"}</strong>
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}

function SignOn({
  briefingId,
  queue,
  setQueue,
  send,
}: {
  briefingId: string;
  queue: PendingSignOn[];
  setQueue: (q: PendingSignOn[]) => void;
  send: () => Promise<void>;
}) {
  const signature = useRef<SignatureFieldHandle>(null);
  const [form, setForm] = useState({ name: "", employer: "", cardNumber: "" });
  const [errors, setErrors] = useState<Record<string, string>>({});

  const signOn = () => {
    const image = signature.current?.toDataUrl() ?? null;
    const found: Record<string, string> = {};
    if (form.name.trim().length < 2) found.name = "Enter your name";
    if (form.employer.trim().length < 2) found.employer = "Enter your employer";
    if (form.cardNumber.trim().length < 3) found.cardNumber = "Enter your competence card number";
    if (!image) found.signature = "Sign in the box";
    setErrors(found);
    if (Object.keys(found).length) return;
    const next = [
      ...loadQueue(briefingId),
      { key: newKey(), ...form, signature: image!, signedAt: new Date().toISOString(), state: "waiting" as const },
    ];
    saveQueue(briefingId, next);
    setQueue(next);
    setForm({ name: "", employer: "", cardNumber: "" });
    signature.current?.clear();
    void send();
  };

  const field = (key: keyof typeof form, label: string) => (
    <label className="block font-bold">
      {label}
      <input
        value={form[key]}
        onChange={(e) => setForm({ ...form, [key]: e.target.value })}
        aria-invalid={errors[key] ? true : undefined}
        className={`mt-1 block w-full rounded border-2 px-3 py-3 text-xl font-normal ${errors[key] ? "border-danger" : "border-rule"}`}
      />
      {errors[key] && (
        <span role="alert" className="text-base text-danger">
          {errors[key]}
        </span>
      )}
    </label>
  );

  return (
    <div className="space-y-4">
      <h2 className="text-2xl font-bold">Sign on</h2>
      <p className="text-base">Each person signs to confirm they were briefed and understood. Hand the phone over.</p>
      {field("name", "Your name")}
      {field("employer", "Employer")}
      {field("cardNumber", "Competence card number")}
      <SignatureField ref={signature} label="Sign with your finger" error={errors.signature} />
      <button type="button" onClick={signOn} className={`${big} w-full bg-accent text-white`}>
        Sign on
      </button>
      <ul className="space-y-1 text-base" data-testid="sign-on-list">
        {queue.map((q) => (
          <li key={q.key}>
            {q.name} ({q.employer}) —{" "}
            {q.state === "sent" ? "recorded" : q.state === "waiting" ? "waiting for signal" : `refused: ${q.problem}`}
          </li>
        ))}
      </ul>
    </div>
  );
}

function SignOff({
  briefingId,
  foremanName,
  waiting,
  sent,
  onDone,
}: {
  briefingId: string;
  foremanName: string;
  waiting: number;
  sent: number;
  onDone: () => void;
}) {
  const signature = useRef<SignatureFieldHandle>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const finish = async () => {
    const image = signature.current?.toDataUrl();
    if (!image) return setProblem("Sign in the box");
    try {
      await apiRequest(`/api/v1/briefings/${briefingId}/complete`, { json: { signature: image } });
      onDone();
    } catch (err) {
      setProblem(
        err instanceof ApiError && err.offline ? "No signal: try again when you have signal." : problemOf(err),
      );
    }
  };
  return (
    <div className="space-y-4">
      <h2 className="text-2xl font-bold">Foreman signs last</h2>
      {waiting > 0 ? (
        <p role="alert" className="font-bold text-band-act">
          {waiting} sign-on{waiting === 1 ? " is" : "s are"} still waiting for signal. They are kept on this phone and
          sent when the signal returns; sign off after that.
        </p>
      ) : (
        <p>
          {sent} operative{sent === 1 ? "" : "s"} signed on. {foremanName}, sign to close the briefing.
        </p>
      )}
      <SignatureField ref={signature} label="Foreman's signature" error={problem ?? undefined} />
      <button
        type="button"
        disabled={waiting > 0 || sent === 0}
        onClick={finish}
        className={`${big} w-full bg-accent text-white disabled:opacity-40`}
      >
        Sign off the briefing
      </button>
    </div>
  );
}
