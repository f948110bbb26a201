import type { Metadata } from "next";
import { DataTable, EmptyState } from "@/app/_components/table";
import { requirePermission } from "@/lib/auth/guard";
import { listOutboundEmails } from "@/lib/mail/log";
import { ukDateTime } from "@/lib/dates";

export const metadata: Metadata = { title: "Sent e-mail" };

const when = (d: Date | null) => ukDateTime(d);

export default async function MailLogPage() {
  const actor = await requirePermission("mail-log:read");
  const rows = await listOutboundEmails(actor);
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Sent e-mail</h1>
      <p className="text-sm text-muted">
        Every e-mail Heftwise sends for your organisation, newest first. Failed ones were tried three times.
      </p>
      {rows.length === 0 ? (
        <EmptyState>Nothing sent yet.</EmptyState>
      ) : (
        <DataTable head={["Created", "To", "Subject", "Kind", "Outcome"]} caption="Sent e-mail">
          {rows.map((row) => (
            <tr key={row.id} className="border-t border-rule">
              <td className="px-3 py-2">{when(row.createdAt)}</td>
              <td className="px-3 py-2">{row.toAddress}</td>
              <td className="px-3 py-2">{row.subject}</td>
              <td className="px-3 py-2">{row.kind}</td>
              <td className="px-3 py-2">
                {row.status === "sent" ? (
                  `Sent ${when(row.sentAt)}`
                ) : row.status === "failed" ? (
                  <span className="font-bold text-danger">Failed: {row.lastError}</span>
                ) : (
                  "Sending"
                )}
              </td>
            </tr>
          ))}
        </DataTable>
      )}
    </div>
  );
}
