import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { BandChip } from "@/app/_components/results/band";
import { TaskResult } from "@/app/_components/results/task-result";
import { reviewContent } from "@/assessments/method-statement/score-task";
import { OPERATION_LABELS } from "@/assessments/method-statement/content";
import { getRevision, listApprovers } from "@/assessments/revisions/service";
import type { Band } from "@/assessments/rules/types";
import { requirePermission } from "@/lib/auth/guard";
import { AppError } from "@/lib/errors";
import { can } from "@/lib/permissions";
import { STEPS } from "./wizard/steps-list";
import { Wizard } from "./wizard/wizard";

export const metadata: Metadata = { title: "Assessment" };

const STATUS_TEXT = { draft: "Draft", submitted: "Submitted — waiting for approval", approved: "Approved", superseded: "Superseded" } as const;

export default async function RevisionPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ step?: string }> }) {
  const actor = await requirePermission("assessments:read");
  const { id } = await params;
  const { step } = await searchParams;
  const data = await getRevision(actor, id).catch((err) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  const { revision, assessment, job, content, register } = data;
  const editable = revision.status === "draft" && can(actor, "assessments:write");
  const initialStep = STEPS.find((s) => s.key === step)?.key;

  return (
    <div className="space-y-4">
      <header>
        <p className="text-sm text-muted">{job.name}</p>
        <h1 className="text-2xl font-bold">{assessment.title}</h1>
        <p className="text-sm">
          Revision {revision.number} · <strong>{STATUS_TEXT[revision.status]}</strong>
          {revision.returnComments ? " · returned with comments" : ""}
        </p>
      </header>
      {editable ? (
        <Wizard
          revisionId={revision.id}
          initialVersion={revision.version}
          initialContent={content}
          register={register}
          approvers={can(actor, "assessments:submit") ? await listApprovers(actor) : []}
          initialStep={initialStep}
        />
      ) : (
        <ReadOnlyRevision content={content} register={register} worstBand={revision.worstBand as Band | null} />
      )}
    </div>
  );
}

function ReadOnlyRevision({ content, register, worstBand }: { content: Awaited<ReturnType<typeof getRevision>>["content"]; register: Awaited<ReturnType<typeof getRevision>>["register"]; worstBand: Band | null }) {
  const review = reviewContent(content, register);
  return (
    <div className="space-y-4">
      <p className="rounded border-l-4 border-band-watch bg-white p-3 text-sm">This revision is no longer a draft and cannot be edited here.</p>
      <div className="flex items-center gap-2">
        <span className="font-bold">Worst band:</span> <BandChip band={worstBand} large />
      </div>
      <section className="rounded-lg border border-rule bg-white p-4">
        <h2 className="text-xl font-bold">Scope</h2>
        <p className="whitespace-pre-line">{content.scope.summary}</p>
        <h2 className="mt-4 text-xl font-bold">Sequence of work</h2>
        <ol className="list-decimal pl-6">
          {content.sequence.map((s) => (
            <li key={s.id}>{s.text}</li>
          ))}
        </ol>
      </section>
      {content.tasks.map((t, i) => (
        <section key={t.id} className="space-y-2 rounded-lg border border-rule bg-white p-4">
          <h2 className="font-bold">
            Task {i + 1}: {t.description} <span className="font-normal text-muted">— {OPERATION_LABELS[t.operation]}</span>
          </h2>
          <TaskResult score={review.scores[i]} />
        </section>
      ))}
    </div>
  );
}
