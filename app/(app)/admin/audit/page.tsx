import type { Metadata } from "next";
import { checkAuditChain } from "@/assessments/audit-trail/queries";
import { requirePermission } from "@/lib/auth/guard";
import { AdminTabs } from "../admin-tabs";

export const metadata: Metadata = { title: "Audit trail" };

export default async function AuditPage() {
  const actor = await requirePermission("audit:read");
  const report = await checkAuditChain(actor);
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Organisation</h1>
      <AdminTabs current="/admin/audit" />
      <section aria-labelledby="chain-heading" className="space-y-3 rounded-lg border border-rule bg-white p-4">
        <h2 id="chain-heading" className="text-lg font-bold">
          Is the audit trail intact?
        </h2>
        <p className="text-sm text-muted">
          Every event carries the fingerprint (SHA-256) of the one before it, so an event changed, removed or moved
          after it was recorded breaks the chain. This check has just walked the whole trail.
        </p>
        {report.intact ? (
          <div data-testid="chain-intact" className="rounded border-l-4 border-band-clear bg-paper p-3">
            <p className="font-bold">Intact: all {report.checked} events link up.</p>
            <p className="mt-1 break-all text-sm">
              Newest event #{report.head.seq}, fingerprint <code>{report.head.hash ?? "—"}</code>. Note it down or keep
              an export elsewhere: a later check that does not reach it would show newest events removed.
            </p>
          </div>
        ) : (
          <div data-testid="chain-broken" role="alert" className="rounded border-l-4 border-danger bg-paper p-3">
            <p className="font-bold">Broken at event #{report.broken.seq}.</p>
            <p className="mt-1 text-sm">{report.broken.explanation}</p>
            <p className="mt-1 text-sm">
              The {report.checked} events before it are intact. Keep the database as it is and tell whoever runs your
              Heftwise installation: this is what an investigation starts from.
            </p>
          </div>
        )}
        <p className="text-sm text-muted">
          Operators can run the same check from the command line: <code>npm run audit:check</code>.
        </p>
      </section>
      <section aria-labelledby="export-heading" className="space-y-2 rounded-lg border border-rule bg-white p-4">
        <h2 id="export-heading" className="text-lg font-bold">
          Export
        </h2>
        <p className="text-sm text-muted">
          The whole trail as CSV, oldest first, with each event&apos;s fingerprints, for your records or an auditor.
        </p>
        <a href="/api/v1/audit/export" className="inline-block font-bold text-accent underline" download>
          Download the audit trail (CSV)
        </a>
      </section>
    </div>
  );
}
