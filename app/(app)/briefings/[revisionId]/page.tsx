import type { Metadata } from "next";
import { getBriefingScript } from "@/assessments/briefing/queries";
import { requirePermission } from "@/lib/auth/guard";
import { BriefingMode } from "./briefing-mode";
import { foundOr404 } from "@/lib/pages";

export const metadata: Metadata = { title: "Briefing" };

export default async function BriefingPage({ params }: { params: Promise<{ revisionId: string }> }) {
  const actor = await requirePermission("briefings:run");
  const { revisionId } = await params;
  const data = await foundOr404(getBriefingScript(actor, revisionId));
  return (
    <BriefingMode
      userId={actor.id}
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
