import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getRevision } from "@/assessments/revisions/service";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { LiftPlanForm } from "./lift-plan-form";
import { foundOr404 } from "@/lib/pages";

export const metadata: Metadata = { title: "Lift plan" };

export default async function LiftPlanPage({ params }: { params: Promise<{ id: string; taskId: string }> }) {
  const actor = await requirePermission("assessments:read");
  const { id, taskId } = await params;
  const data = await foundOr404(getRevision(actor, id));
  const task = data.content.tasks.find((t) => t.id === taskId && t.operation === "equipment");
  if (!task) notFound();
  const component = data.register.find((c) => c.id === task.componentId);
  const editable = data.revision.status === "draft" && can(actor, "assessments:write");
  return (
    <div className="space-y-4">
      <Link href={`/revisions/${id}?step=loads`} className="font-bold text-accent underline">
        ← Back to Loads &amp; lifts
      </Link>
      <header>
        <p className="text-sm text-muted">
          {data.job.name} · {data.assessment.title}
        </p>
        <h1 className="text-2xl font-bold">Lift plan: {task.description || "lift with equipment"}</h1>
        <p className="text-sm text-muted">
          Planned by a competent person under LOLER 1998 reg. 8; roles as BS 7121 names them. Load:{" "}
          {component
            ? `${component.name}, ${component.massKg * (task.quantity || 1)} kg`
            : "choose the component on the Loads & lifts step"}
          {component?.massSource === "estimated" ? " (estimated mass — confirm by weighing)" : ""}.
        </p>
      </header>
      <LiftPlanForm
        revisionId={id}
        taskId={taskId}
        version={data.revision.version}
        content={data.content}
        load={component ? component.massKg * (task.quantity || 1) : null}
        editable={editable}
      />
    </div>
  );
}
