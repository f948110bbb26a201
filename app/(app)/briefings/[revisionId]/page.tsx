import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getBriefingScript } from "@/assessments/briefing/service";
import { requirePermission } from "@/lib/auth/guard";
import { AppError } from "@/lib/errors";
import { BriefingMode } from "./briefing-mode";

export const metadata: Metadata = { title: "Briefing" };

export default async function BriefingPage({ params }: { params: Promise<{ revisionId: string }> }) {
  const actor = await requirePermission("briefings:run");
  const { revisionId } = await params;
  const data = await getBriefingScript(actor, revisionId).catch((err) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  return (
    <BriefingMode
      revisionId={revisionId}
      title={data.title}
      job={data.job}
      revisionNumber={data.revision.number}
      script={data.script}
      siteChanges={data.siteChanges}
      foremanName={actor.name}
    />
  );
}
