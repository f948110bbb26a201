"use client";

import Link from "next/link";
import { useRef, useState } from "react";
import { BandChip } from "@/app/_components/results/band";
import { SignatureField, type SignatureFieldHandle } from "@/app/_components/signature-field";
import type { BriefingScript } from "@/assessments/briefing/instructions";
import { LINE_CAUTION } from "@/assessments/method-statement/lineside";
import { ukDateTime } from "@/lib/dates";
import { keepOnPhone, newKey, startOnPhone, type OutgoingRecord, type PhoneBriefing } from "../device/store";
import { sendWaiting } from "../device/send";
import { usePhone } from "../device/use-phone";
import { RecordState, recordStatus, SupersededNotice } from "../device/record-state";

interface Props {
  userId: string;
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

/** An unfinished briefing can be carried on for this long after it started (Heftwise policy: one shift). */
const CARRY_ON_HOURS = 12;

/**
 * The briefing, screen by screen, from the copy on this phone. Everything the foreman records waits on
 * the phone and is sent in order when there is signal (../device/send.ts): with signal that is at once,
 * without it when the signal returns. The screen always says what waits, what was sent and what was
 * refused.
 */
export function BriefingMode({
  userId,
  revisionId,
  title,
  revisionNumber,
  job,
  script,
  siteChanges,
  foremanName,
}: Props) {
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
  const phone = usePhone(userId);
  const [position, setPosition] = useState(-1);
  const [briefingKey, setBriefingKey] = useState<string | null>(null);
  const [place, setPlace] = useState(job.accessPoint ?? "");
  const [problem, setProblem] = useState<string | null>(null);
  const briefing = phone.briefings.find((b) => b.key === briefingKey) ?? null;
  const records = phone.records.filter((r) => r.briefingKey === briefingKey);
  const signOns = records.filter((r) => r.kind === "sign-on");
  const signOff = records.find((r) => r.kind === "sign-off");
  const screen: Screen = signOff ? { kind: "done" } : position < 0 || !briefing ? { kind: "start" } : screens[position];

  const unfinished = phone.briefings
    .filter(
      (b) =>
        b.revisionId === revisionId &&
        phone.readAt - Date.parse(b.startedAt) < CARRY_ON_HOURS * 3_600_000 &&
        !phone.records.some(
          (r) => r.briefingKey === b.key && (r.kind === "sign-off" || (r.kind === "start" && r.state === "refused")),
        ),
    )
    .sort((a, b) => b.startedAt.localeCompare(a.startedAt));

  const start = async () => {
    if (place.trim().length < 2) return setProblem("Say where the briefing is held");
    setProblem(null);
    const key = newKey();
    await startOnPhone({
      key,
      userId,
      revisionId,
      revisionNumber,
      title,
      jobName: job.name,
      place: place.trim(),
      startedAt: new Date().toISOString(),
    });
    setBriefingKey(key);
    setPosition(0);
    void sendWaiting(userId);
  };

  const carryOn = (b: PhoneBriefing) => {
    setBriefingKey(b.key);
    const signedOn = phone.records.some((r) => r.briefingKey === b.key && r.kind === "sign-on");
    setPosition(signedOn ? screens.findIndex((s) => s.kind === "sign-on") : 0);
  };

  const replaced = phone.copies?.replaced.find((r) => r.revisionId === revisionId);
  const noLongerCurrent =
    phone.copies?.updatedAt != null && !phone.copies.revisions.some((r) => r.revisionId === revisionId);

  return (
    <div className="mx-auto max-w-2xl space-y-5 text-lg" data-testid="briefing-mode">
      <header className="space-y-1">
        <p className="text-base text-muted">
          {job.name} · revision {revisionNumber}
        </p>
        <h1 className="text-2xl font-bold">{title}</h1>
        <CopyLine online={phone.online} updatedAt={phone.copies?.updatedAt ?? null} />
        {briefing && <RecordState records={records} online={phone.online} />}
      </header>

      {noLongerCurrent && screen.kind !== "done" && (
        <section role="alert" className="rounded-lg border-4 border-band-act bg-white p-4" data-testid="newer-revision">
          <h2 className="text-xl font-bold text-band-act">
            {replaced?.newer ? `A newer revision exists: revision ${replaced.newer}` : "No longer approved"}
          </h2>
          <p className="text-base">
            This copy is not the approved revision any more. Do not brief from it: open{" "}
            <Link href="/briefings" className="font-bold underline">
              Briefings
            </Link>{" "}
            for the current one.
          </p>
        </section>
      )}

      {briefing?.superseded && <SupersededNotice briefing={briefing} />}

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
            {unfinished.length > 0 && (
              <div className="space-y-2 rounded border-2 border-band-watch p-3" data-testid="unfinished">
                <p className="font-bold">Not yet signed off on this phone:</p>
                {unfinished.map((b) => (
                  <button
                    key={b.key}
                    type="button"
                    onClick={() => carryOn(b)}
                    className="block w-full rounded border-2 border-rule px-3 py-2 text-left"
                  >
                    Carry on: {b.place}, started {ukDateTime(new Date(b.startedAt))}
                  </button>
                ))}
              </div>
            )}
            <label className="block font-bold">
              Where are you briefing?
              <input
                value={place}
                onChange={(e) => setPlace(e.target.value)}
                maxLength={200}
                aria-invalid={problem ? true : undefined}
                className="mt-2 block w-full rounded border-2 border-rule px-3 py-3 text-xl font-normal"
              />
            </label>
            {problem && (
              <p role="alert" className="font-bold text-danger">
                {problem}
              </p>
            )}
            <button
              type="button"
              onClick={start}
              disabled={!phone.loaded}
              className={`${big} w-full bg-accent text-white`}
            >
              Start
            </button>
            {!phone.online && (
              <p className="text-base text-muted">
                No signal: you can brief, take sign-ons and sign off. They wait on this phone and are sent, once and in
                order, when the signal returns and Heftwise is open.
              </p>
            )}
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
        {screen.kind === "sign-on" && briefing && (
          <SignOn userId={userId} briefingKey={briefing.key} signOns={signOns} />
        )}
        {screen.kind === "sign-off" && briefing && (
          <SignOff userId={userId} briefingKey={briefing.key} foremanName={foremanName} signOns={signOns} />
        )}
        {screen.kind === "done" && briefing && signOff && (
          <Done briefing={briefing} signOns={signOns} signOff={signOff} />
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

function SignOn({ userId, briefingKey, signOns }: { userId: string; briefingKey: string; signOns: OutgoingRecord[] }) {
  const signature = useRef<SignatureFieldHandle>(null);
  const [form, setForm] = useState({ name: "", employer: "", cardNumber: "" });
  const [errors, setErrors] = useState<Record<string, string>>({});

  const signOn = async () => {
    const image = signature.current?.toDataUrl() ?? null;
    const found: Record<string, string> = {};
    if (form.name.trim().length < 2) found.name = "Enter your name";
    if (form.employer.trim().length < 2) found.employer = "Enter your employer";
    if (form.cardNumber.trim().length < 3) found.cardNumber = "Enter your competence card number";
    if (!image) found.signature = "Sign in the box";
    setErrors(found);
    if (Object.keys(found).length) return;
    const person = { name: form.name.trim(), employer: form.employer.trim(), cardNumber: form.cardNumber.trim() };
    await keepOnPhone({
      userId,
      briefingKey,
      kind: "sign-on",
      label: `${person.name} (${person.employer})`,
      body: { key: newKey(), ...person, signature: image!, signedAt: new Date().toISOString() },
    });
    setForm({ name: "", employer: "", cardNumber: "" });
    signature.current?.clear();
    void sendWaiting(userId);
  };

  const field = (key: keyof typeof form, label: string, max: number) => (
    <label className="block font-bold">
      {label}
      <input
        value={form[key]}
        onChange={(e) => setForm({ ...form, [key]: e.target.value })}
        maxLength={max}
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
      {field("name", "Your name", 120)}
      {field("employer", "Employer", 120)}
      {field("cardNumber", "Competence card number", 40)}
      <SignatureField ref={signature} label="Sign with your finger" error={errors.signature} />
      <button type="button" onClick={signOn} className={`${big} w-full bg-accent text-white`}>
        Sign on
      </button>
      <ul className="space-y-1 text-base" data-testid="sign-on-list">
        {signOns.map((r) => (
          <li key={r.seq}>
            {r.label} — {recordStatus(r, "recorded")}
          </li>
        ))}
      </ul>
    </div>
  );
}

function SignOff({
  userId,
  briefingKey,
  foremanName,
  signOns,
}: {
  userId: string;
  briefingKey: string;
  foremanName: string;
  signOns: OutgoingRecord[];
}) {
  const signature = useRef<SignatureFieldHandle>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const taken = signOns.filter((r) => r.state !== "refused").length;
  const waiting = signOns.filter((r) => r.state === "waiting").length;
  const finish = async () => {
    const image = signature.current?.toDataUrl();
    if (!image) return setProblem("Sign in the box");
    await keepOnPhone({
      userId,
      briefingKey,
      kind: "sign-off",
      label: `Signed off by ${foremanName}`,
      body: { key: newKey(), signature: image, signedAt: new Date().toISOString() },
    });
    void sendWaiting(userId);
  };
  return (
    <div className="space-y-4">
      <h2 className="text-2xl font-bold">Foreman signs last</h2>
      {taken === 0 ? (
        <p role="alert" className="font-bold text-band-act">
          Nobody has signed on yet: at least one operative signs on before you sign off.
        </p>
      ) : (
        <p>
          {taken} operative{taken === 1 ? "" : "s"} signed on
          {waiting > 0 ? ` (${waiting} still waiting for signal: they are sent first, then your sign-off)` : ""}.{" "}
          {foremanName}, sign to close the briefing.
        </p>
      )}
      <SignatureField ref={signature} label="Foreman's signature" error={problem ?? undefined} />
      <button
        type="button"
        disabled={taken === 0}
        onClick={finish}
        className={`${big} w-full bg-accent text-white disabled:opacity-40`}
      >
        Sign off the briefing
      </button>
    </div>
  );
}

function Done({
  briefing,
  signOns,
  signOff,
}: {
  briefing: PhoneBriefing;
  signOns: OutgoingRecord[];
  signOff: OutgoingRecord;
}) {
  const taken = signOns.filter((r) => r.state !== "refused").length;
  const allSent = signOff.state === "sent" && signOns.every((r) => r.state !== "waiting");
  return (
    <div className="space-y-3" data-testid="briefing-done">
      <h2 className="text-2xl font-bold">{allSent ? "Briefing recorded" : "Briefing signed off on this phone"}</h2>
      <p>
        {taken} operative{taken === 1 ? "" : "s"} signed on, and you signed it off.
      </p>
      {signOff.state === "refused" && (
        <p role="alert" className="font-bold text-danger">
          The sign-off was refused: {signOff.problem}
        </p>
      )}
      {!allSent && signOff.state !== "refused" && (
        <p className="font-bold text-band-watch">
          Waiting on this phone until there is signal. Keep Heftwise open when you are back in signal; nothing is lost
          if the phone is switched off.
        </p>
      )}
      {briefing.serverId && allSent && (
        <Link
          href={`/briefings/record/${briefing.serverId}`}
          className={`${big} block bg-accent text-center text-white`}
        >
          See the briefing record
        </Link>
      )}
      <Link href="/briefings" className={`${big} block border-2 border-rule bg-white text-center`}>
        Back to your briefings
      </Link>
    </div>
  );
}

/** Whether this screen comes from the network or from the copy kept on the phone, and how old that is. */
function CopyLine({ online, updatedAt }: { online: boolean; updatedAt: string | null }) {
  if (online) return null;
  return (
    <p className="rounded bg-frame px-3 py-2 text-base font-bold text-frame-ink" data-testid="copy-line">
      No signal · the copy kept on this phone
      {updatedAt ? `, brought up to date ${ukDateTime(new Date(updatedAt))}` : ""}
    </p>
  );
}
