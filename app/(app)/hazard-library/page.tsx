import type { Metadata } from "next";
import Link from "next/link";
import { ActionLink, PageHeader } from "@/app/_components/page-header";
import { listLibrary } from "@/assessments/hazard-library/queries";
import { CONTROL_LEVEL_LABELS, riskRating } from "@/assessments/method-statement/options";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { RestoreStarterButton } from "./restore-starter-button";

export const metadata: Metadata = { title: "Hazard library" };

export default async function HazardLibraryPage() {
  const actor = await requirePermission("hazard-library:read");
  const entries = await listLibrary(actor);
  const manage = can(actor, "hazard-library:manage");
  return (
    <div className="space-y-4">
      <PageHeader title="Hazard library">
        {manage && <ActionLink href="/hazard-library/new">New hazard</ActionLink>}
      </PageHeader>
      <p className="max-w-3xl text-sm text-muted">
        Hazards of lineside work with suggested controls by the hierarchy of control. Advisers copy them into an
        assessment&rsquo;s hazards step and change them there for the job;{" "}
        {manage ? "you maintain the library for the organisation." : "admins maintain the library."}
      </p>
      {manage && <RestoreStarterButton />}
      {entries.length === 0 && (
        <p className="rounded border border-dashed border-rule bg-white p-4 text-muted">The library is empty.</p>
      )}
      <ul className="grid gap-3 lg:grid-cols-2">
        {entries.map((e) => (
          <li key={e.id} className="space-y-2 rounded-lg border border-rule bg-white p-4" data-testid="library-entry">
            <div className="flex items-start justify-between gap-2">
              <h2 className="font-bold">{e.hazard}</h2>
              {manage && (
                <Link href={`/hazard-library/${e.id}`} className="shrink-0 font-bold text-accent underline">
                  Edit<span className="sr-only"> {e.hazard}</span>
                </Link>
              )}
            </div>
            <p className="text-sm text-muted">
              {e.whoIsAtRisk} · rating {riskRating(e.likelihoodBefore, e.severityBefore)} before,{" "}
              {riskRating(e.likelihoodAfter, e.severityAfter)} after
            </p>
            <ul className="space-y-0.5 text-sm">
              {e.controls.map((c, i) => (
                <li key={i}>
                  <strong>{CONTROL_LEVEL_LABELS[c.level]}:</strong> {c.text}
                </li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
    </div>
  );
}
