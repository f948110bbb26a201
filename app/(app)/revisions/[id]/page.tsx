import { getOrganisationSettings } from "@/lib/organisations/service";
import type { Metadata } from "next";
import Link from "next/link";
import { rescoredByCurrentRules, type TaskScore } from "@/assessments/method-statement/score-task";
import { getRevision, listApprovers, reviewOf } from "@/assessments/revisions/service";
import type { Band } from "@/assessments/rules/types";
import { Notice } from "@/app/_components/notice";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { STEPS } from "./wizard/steps-list";
import { Wizard } from "./wizard/wizard";
import { NewRevisionButton } from "./new-revision-button";
import { ReadOnlyRevision } from "./read-only-revision";
import { RescoredNotice } from "./rescored-notice";
import { foundOr404 } from "@/lib/pages";
import { ukDate, ukDateTime } from "@/lib/dates";
import { listOpenSiteChanges } from "@/assessments/briefing/queries";
import { SiteChangeDecision } from "./site-change-decision";

export const metadata: Metadata = { title: "Assessment" };

const STATUS_TEXT = {
  draft: "Draft",
  submitted: "Submitted — waiting for approval",
  approved: "Approved",
  superseded: "Superseded",
} as const;

export default async function RevisionPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ step?: string; notice?: string }>;
}) {
  const actor = await requirePermission("assessments:read");
  const { id } = await params;
  const { step, notice } = await searchParams;
  const data = await foundOr404(getRevision(actor, id));
  const { revision, assessment, job, content, register } = data;
  const editable = revision.status === "draft" && can(actor, "assessments:write");
  // What the page needs besides the revision, asked for at once rather than one after another.
  const [siteChanges, approvers, settings] = await Promise.all([
    revision.status === "draft" ? [] : listOpenSiteChanges(actor, revision.id),
    editable && can(actor, "assessments:submit") ? listApprovers(actor) : [],
    editable ? getOrganisationSettings(actor) : null,
  ]);
  const initialStep = STEPS.find((s) => s.key === step)?.key;
  const returned = revision.returnComments as { by: string; comments: Record<string, string> } | null;
  // Only a draft is scored afresh; submitted and approved revisions keep their stored results.
  // A loaded draft's content has passed the content schema, so this is the wizard's own result for it
  // until the first change.
  const review = revision.status === "draft" ? reviewOf(data) : null;
  const rescored = review
    ? rescoredByCurrentRules(content.tasks, revision.results as TaskScore[] | null, review.scores)
    : [];

  return (
    <div className="space-y-4">
      <header>
        <p className="text-sm text-muted">{job.name}</p>
        <h1 className="text-2xl font-bold">{assessment.title}</h1>
        <p className="text-sm">
          Revision {revision.number} · <strong data-testid="revision-status">{STATUS_TEXT[revision.status]}</strong>
          {revision.reviewDate ? ` · review by ${ukDate(revision.reviewDate)}` : ""}
        </p>
      </header>
      <Notice code={notice} />
      {siteChanges.length > 0 && (
        <section
          data-testid="needs-review"
          role="alert"
          className="space-y-3 rounded-lg border-4 border-band-act bg-white p-4"
        >
          <h2 className="text-lg font-bold text-band-act">Needs review: site change reported</h2>
          <ul className="space-y-1">
            {siteChanges.map((c) => (
              <li key={c.id}>
                {c.text}{" "}
                <span className="text-sm text-muted">
                  — {c.by}, {ukDateTime(c.at)}
                </span>
              </li>
            ))}
          </ul>
          <p className="text-sm">
            Decide before the next briefing: start a new revision if the work or its controls must change, or record why
            this one still holds. Briefings warn of these notes until then.
          </p>
          {can(actor, "assessments:write") && <SiteChangeDecision revisionId={revision.id} />}
        </section>
      )}
      <nav className="flex flex-wrap gap-4 text-sm">
        {revision.status !== "draft" && (
          <a href={`/api/v1/revisions/${revision.id}/pack`} className="font-bold text-accent underline">
            Download the {revision.status === "submitted" ? "draft" : "signed"} pack (PDF)
          </a>
        )}
        <Link href={`/assessments/${assessment.id}/audit`} className="font-bold text-accent underline">
          Audit trail
        </Link>
        {revision.status === "approved" && can(actor, "assessments:write") && (
          <NewRevisionButton revisionId={revision.id} />
        )}
      </nav>
      {revision.status === "draft" && returned && (
        <section className="rounded-lg border-l-4 border-band-act bg-white p-4" aria-label="Returned with comments">
          <h2 className="font-bold">Returned by {returned.by} with comments</h2>
          <ul className="mt-1 space-y-1">
            {Object.entries(returned.comments).map(([step, text]) => (
              <li key={step}>
                <strong>{STEPS.find((s) => s.key === step)?.label ?? step}:</strong> {text}
              </li>
            ))}
          </ul>
        </section>
      )}
      <RescoredNotice tasks={rescored} />
      {editable && settings && review ? (
        <Wizard
          revisionId={revision.id}
          initialVersion={revision.version}
          initialContent={content}
          register={register}
          approvers={approvers}
          reviewPeriodMonths={settings.reviewPeriodMonths}
          fromLibrary={can(actor, "hazard-library:read")}
          saved={review}
          initialStep={initialStep}
        />
      ) : (
        <>
          <p className="rounded border-l-4 border-band-watch bg-white p-3 text-sm">
            {revision.status === "draft"
              ? "Your role can read this draft but not edit it."
              : "This revision is no longer a draft and cannot be edited here."}
            {revision.status === "approved" && " To change it, start a new revision."}
          </p>
          <ReadOnlyRevision
            content={content}
            scores={(revision.results ?? []) as TaskScore[]}
            worstBand={revision.worstBand as Band | null}
          />
        </>
      )}
    </div>
  );
}
