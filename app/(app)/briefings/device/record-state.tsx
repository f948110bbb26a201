"use client";

import type { OutgoingRecord, PhoneBriefing } from "./store";

/** What became of a record, in words; `sent` is how a sent one reads where it is shown. */
export const recordStatus = (r: OutgoingRecord, sent: string) =>
  r.state === "sent" ? sent : r.state === "refused" ? `refused: ${r.problem}` : (r.problem ?? "waiting for signal");

/** One line for a briefing's records: signal, how many signed on, what waits, what was refused. */
export function RecordState({ records, online }: { records: OutgoingRecord[]; online: boolean }) {
  const signedOn = records.filter((r) => r.kind === "sign-on" && r.state !== "refused").length;
  const waiting = records.filter((r) => r.state === "waiting");
  const refused = records.filter((r) => r.state === "refused").length;
  const why = waiting.find((r) => r.problem)?.problem;
  return (
    <p
      role="status"
      className={`rounded px-3 py-2 text-base font-bold ${refused ? "bg-danger text-white" : waiting.length ? "bg-band-watch text-white" : "bg-teal-50"}`}
      data-testid="sign-on-status"
    >
      {online ? "Online" : "No signal"} · {signedOn} signed on
      {waiting.length ? ` · ${waiting.length} waiting to send` : signedOn ? " · all recorded" : ""}
      {refused ? ` · ${refused} refused` : ""}
      {why ? ` · ${why}` : ""}
    </p>
  );
}

/** A briefing taken from a revision that had been superseded: recorded as such, and the adviser told. */
export function SupersededNotice({ briefing }: { briefing: PhoneBriefing }) {
  const s = briefing.superseded!;
  return (
    <section role="alert" className="rounded-lg border-4 border-band-stop bg-white p-4" data-testid="superseded">
      <h2 className="text-xl font-bold">Briefed from an old revision</h2>
      <p className="text-base">
        Revision {s.revisionNumber} of {briefing.title} had been superseded
        {s.currentRevisionNumber ? ` by revision ${s.currentRevisionNumber}` : ""} while this phone had no signal. The
        briefing at {briefing.place} is recorded as taken against the old revision, and your safety adviser has been
        told. Stop and brief the gang again from the current revision before work goes on.
      </p>
    </section>
  );
}
