import type { Metadata } from "next";
import Link from "next/link";
import { BandChip } from "@/app/_components/results/band";
import { EmptyState } from "@/app/_components/table";
import { listForemanJobs } from "@/assessments/briefing/queries";
import type { Band } from "@/assessments/rules/types";
import { requirePermission } from "@/lib/auth/guard";
import { EmailSheetButton } from "./email-sheet-button";
import { ukDate, ukDateTime } from "@/lib/dates";
import { PhonePanel } from "./device/phone-panel";

export const metadata: Metadata = { title: "Briefings" };

export default async function BriefingsPage() {
  const actor = await requirePermission("briefings:run");
  const jobs = await listForemanJobs(actor);
  return (
    <div className="space-y-5">
      <h1 className="text-2xl font-bold">Your jobs</h1>
      <PhonePanel userId={actor.id} />
      {jobs.length === 0 && <EmptyState>You are not assigned to a job yet. Ask your safety adviser.</EmptyState>}
      {jobs.map(({ job, revisions }) => (
        <section key={job.id} className="space-y-3 rounded-lg border border-rule bg-white p-4" aria-label={job.name}>
          <h2 className="text-xl font-bold">{job.name}</h2>
          <p className="text-sm text-muted">
            {job.accessPoint ? `Access: ${job.accessPoint}. ` : ""}
            {job.siteContactName ? `Site contact: ${job.siteContactName} ${job.siteContactPhone ?? ""}` : ""}
          </p>
          {revisions.length === 0 && (
            <p className="text-muted">No approved assessment for this job yet: there is nothing to brief from.</p>
          )}
          {revisions.map((r) => (
            <article
              key={r.revisionId}
              className="space-y-2 rounded border border-rule bg-paper p-3"
              data-testid={`briefable-${r.revisionId}`}
            >
              <div className="flex flex-wrap items-center gap-2">
                <h3 className="text-lg font-bold">{r.title}</h3>
                <BandChip band={r.worstBand as Band | null} />
              </div>
              <p className="text-sm">
                Revision {r.number} · review by {ukDate(r.reviewDate)}
                {r.needsReview && <strong className="ml-2 text-band-act">Site change reported — needs review</strong>}
              </p>
              {r.briefingsToday.length > 0 && (
                <p className="text-sm">
                  Briefed today:{" "}
                  {r.briefingsToday.map((b) => (
                    <Link
                      key={b.id}
                      href={`/briefings/record/${b.id}`}
                      className="mr-2 font-bold text-accent underline"
                    >
                      {ukDateTime(b.startedAt)} at {b.place}
                      {b.completedAt ? "" : " (not signed off)"}
                    </Link>
                  ))}
                </p>
              )}
              <div className="flex flex-wrap gap-2">
                <Link
                  href={`/briefings/${r.revisionId}`}
                  className="rounded bg-accent px-5 py-3 text-lg font-bold text-white"
                >
                  Brief the gang
                </Link>
                <Link
                  href={`/briefings/${r.revisionId}/site-change`}
                  className="rounded border border-band-act bg-white px-4 py-3 font-bold text-band-act"
                >
                  Report a site change
                </Link>
                <a
                  href={`/api/v1/revisions/${r.revisionId}/briefing-sheet`}
                  className="rounded border border-rule bg-white px-4 py-3 font-bold"
                >
                  Briefing sheet (PDF)
                </a>
                <EmailSheetButton revisionId={r.revisionId} />
              </div>
            </article>
          ))}
        </section>
      ))}
    </div>
  );
}
