import type { Metadata } from "next";
import { getBriefingScript } from "@/assessments/briefing/queries";
import { requirePermission } from "@/lib/auth/guard";
import { SiteChangeForm } from "./site-change-form";
import { foundOr404 } from "@/lib/pages";

export const metadata: Metadata = { title: "Report a site change" };

export default async function SiteChangePage({ params }: { params: Promise<{ revisionId: string }> }) {
  const actor = await requirePermission("site-notes:create");
  const { revisionId } = await params;
  const data = await foundOr404(getBriefingScript(actor, revisionId));
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <h1 className="text-2xl font-bold">Report a site change</h1>
      <p>
        {data.title} · {data.job.name}. Say what is different from the assessment. The safety adviser is e-mailed, the
        assessment is marked as needing review, and the next briefing shows your note.
      </p>
      <SiteChangeForm revisionId={revisionId} />
    </div>
  );
}
