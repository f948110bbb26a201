import type { Metadata } from "next";
import { SafetyCaution } from "@/app/_components/safety-caution";
import type { TaskScore } from "@/assessments/method-statement/score-task";
import { getReview } from "@/assessments/revisions/approval";
import type { Band } from "@/assessments/rules/types";
import { Notice } from "@/app/_components/notice";
import { requirePermission } from "@/lib/auth/guard";
import { hasSecondFactor } from "@/lib/auth/step-up";
import { ReadOnlyRevision } from "../../revisions/[id]/read-only-revision";
import { ReviewActions } from "./review-actions";
import { foundOr404 } from "@/lib/pages";
import { ukDate, ukDateTime } from "@/lib/dates";

export const metadata: Metadata = { title: "Review" };

export default async function ReviewPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ notice?: string }>;
}) {
  const actor = await requirePermission("reviews:read");
  const { id } = await params;
  const { notice } = await searchParams;
  const review = await foundOr404(getReview(actor, id), ["forbidden"]);
  const { revision, assessment, job, content, author, signatures } = review;
  return (
    <div className="space-y-4">
      <header>
        <p className="text-sm text-muted">{job.name}</p>
        <h1 className="text-2xl font-bold">Review: {assessment.title}</h1>
        <p className="text-sm">
          Revision {revision.number} by {author?.name ?? "—"}, submitted {ukDateTime(revision.submittedAt)} · review by{" "}
          {ukDate(revision.reviewDate)} ·{" "}
          <strong data-testid="review-status">
            {revision.status === "submitted"
              ? "Waiting for your decision"
              : revision.status === "approved"
                ? "Approved"
                : revision.status}
          </strong>
        </p>
        <a href={`/api/v1/revisions/${revision.id}/pack`} className="mt-2 inline-block font-bold text-accent underline">
          Download the {revision.status === "submitted" ? "draft" : "signed"} pack (PDF)
        </a>
      </header>
      <Notice code={notice} />
      <ReadOnlyRevision
        content={content}
        scores={(revision.results ?? []) as TaskScore[]}
        worstBand={revision.worstBand as Band | null}
      />
      {revision.status === "submitted" ? (
        <ReviewActions
          revisionId={revision.id}
          version={revision.version}
          contentHash={revision.contentHash ?? ""}
          secondFactor={await hasSecondFactor(actor.id)}
          defaultName={actor.name}
        />
      ) : (
        <p className="rounded-lg border border-rule bg-white p-4">
          {signatures.map((s) => `Countersigned by ${s.name}, ${s.role}, ${ukDateTime(s.signedAt)}.`).join(" ")}
        </p>
      )}
      <SafetyCaution />
    </div>
  );
}
