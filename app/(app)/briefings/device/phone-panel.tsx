"use client";

import Link from "next/link";
import { ukDate, ukDateTime } from "@/lib/dates";
import { canKeepCopies } from "./copies";
import { recordStatus, SupersededNotice } from "./record-state";
import { usePhone } from "./use-phone";

/** Briefings shown in the phone's record for this long after their last record was sent (Heftwise policy). */
const SHOW_SENT_FOR_DAYS = 2;

/**
 * On the foreman's list: what this phone keeps for use without signal and how fresh it is, revisions
 * replaced since, and every record on the phone — waiting, sent, or refused and why.
 */
export function PhonePanel({ userId }: { userId: string }) {
  const phone = usePhone(userId);
  if (!phone.loaded) return null;
  const { copies } = phone;
  const recent = phone.briefings
    .map((b) => ({ briefing: b, records: phone.records.filter((r) => r.briefingKey === b.key) }))
    .filter(
      ({ records }) =>
        records.some((r) => r.state !== "sent") ||
        records.some((r) => r.sentAt && phone.readAt - Date.parse(r.sentAt) < SHOW_SENT_FOR_DAYS * 86_400_000),
    )
    .sort((a, b) => b.briefing.startedAt.localeCompare(a.briefing.startedAt));
  const waiting = phone.records.filter((r) => r.state === "waiting").length;

  return (
    <section
      className="space-y-3 rounded-lg border-2 border-frame bg-white p-4"
      aria-label="This phone"
      data-testid="phone-panel"
    >
      <h2 className="text-lg font-bold">On this phone</h2>
      <p data-testid="copies-state" className={phone.online ? "" : "font-bold"}>
        {!canKeepCopies()
          ? "This connection is not secure (plain http), so the phone cannot keep briefings for use without signal. Ask your administrator for the https address."
          : copies?.updatedAt
            ? `${phone.online ? "Online" : "No signal"} · ${copies.revisions.length} briefing${copies.revisions.length === 1 ? "" : "s"} kept for use without signal, brought up to date ${ukDateTime(new Date(copies.updatedAt))}.`
            : phone.online
              ? "Saving your briefings on this phone for use without signal…"
              : "No signal, and no briefings saved on this phone yet: open Heftwise once with signal."}
      </p>
      {copies?.problem && <p className="text-band-watch">{copies.problem}</p>}
      {copies?.replaced.map((r) => (
        <p key={`${r.revisionId}-${r.at}`} className="text-base" data-testid="replaced">
          <strong>{r.title}</strong> ({r.jobName}): revision {r.number}{" "}
          {r.newer ? `was replaced by revision ${r.newer}` : "is no longer approved"} on {ukDate(new Date(r.at))}; the
          copy on this phone was {r.newer ? "updated" : "removed"}.
        </p>
      ))}
      {waiting > 0 && (
        <p className="font-bold text-band-watch" role="status">
          {waiting} record{waiting === 1 ? "" : "s"} waiting to send. They are sent in order when there is signal and
          Heftwise is open.
        </p>
      )}
      {recent.length > 0 && (
        <ul className="space-y-3" data-testid="phone-records">
          {recent.map(({ briefing, records }) => (
            <li key={briefing.key} className="rounded border border-rule p-3">
              <p className="font-bold">
                {briefing.title} · revision {briefing.revisionNumber}
              </p>
              <p className="text-sm text-muted">
                {briefing.place}, started {ukDateTime(new Date(briefing.startedAt))}
              </p>
              {briefing.superseded && <SupersededNotice briefing={briefing} />}
              <ul className="mt-1 text-sm">
                {records.map((r) => (
                  <li key={r.seq} className={r.state === "refused" ? "font-bold text-danger" : ""}>
                    {r.kind === "start" ? "Start" : r.kind === "sign-on" ? "Sign-on" : "Sign-off"}: {r.label} —{" "}
                    {recordStatus(r, `sent ${r.sentAt ? ukDateTime(new Date(r.sentAt)) : ""}`)}
                  </li>
                ))}
              </ul>
              {briefing.serverId && (
                <Link
                  href={`/briefings/record/${briefing.serverId}`}
                  className="text-sm font-bold text-accent underline"
                >
                  The briefing record
                </Link>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
