import type { Metadata } from "next";
import { DataTable } from "@/app/_components/table";
import { getBriefingRecord } from "@/assessments/briefing/queries";
import { requireActor } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { PrintButton } from "./print-button";
import { foundOr404 } from "@/lib/pages";
import { ukDateTime } from "@/lib/dates";
import { sentLater } from "@/assessments/briefing/schemas";

export const metadata: Metadata = { title: "Briefing record" };

const when = (d: Date) => ukDateTime(d);

export default async function BriefingRecordPage({ params }: { params: Promise<{ briefingId: string }> }) {
  const actor = await requireActor();
  const { briefingId } = await params;
  const { briefing, context, attendees } = await foundOr404(getBriefingRecord(actor, briefingId));
  return (
    <div className="space-y-4 print:text-black">
      <div className="flex flex-wrap items-center justify-between gap-2 print:hidden">
        <h1 className="text-2xl font-bold">Briefing record</h1>
        <div className="flex gap-2">
          <PrintButton />
          {can(actor, "briefings:run") && (
            <a
              href={`/api/v1/revisions/${briefing.revisionId}/briefing-sheet?briefing=${briefing.id}`}
              className="rounded border border-rule bg-white px-4 py-2 font-bold"
            >
              Briefing sheet with this record (PDF)
            </a>
          )}
        </div>
      </div>
      <section className="rounded-lg border border-rule bg-white p-4">
        <p className="text-lg font-bold">{context.title}</p>
        <p>
          {context.job} · revision {context.number}
        </p>
        <p>
          Held at {briefing.place} on {when(briefing.startedAt)} by {briefing.foremanName}.{" "}
          <strong data-testid="record-state">
            {briefing.completedAt ? `Signed off ${when(briefing.completedAt)}.` : "Not yet signed off by the foreman."}
          </strong>
        </p>
        {sentLater(briefing.startedAt, briefing.receivedAt) && (
          <p className="text-muted">
            Taken on the foreman&rsquo;s phone without signal; received {when(briefing.receivedAt)}.
          </p>
        )}
        {briefing.againstSuperseded && (
          <p
            role="alert"
            className="mt-2 rounded border-l-4 border-band-act bg-white px-3 py-2 font-bold"
            data-testid="against-superseded"
          >
            Briefed from revision {context.number} after it had been superseded: the foreman&rsquo;s phone had no signal
            and still held the old revision. Check whether the changes matter and whether the gang must be briefed
            again.
          </p>
        )}
      </section>
      <div data-testid="attendees">
        <DataTable head={["Name", "Employer", "Card", "Signed", "Signature"]} caption="Operatives who signed on">
          {attendees.map((a) => (
            <tr key={a.id} className="border-t border-rule">
              <td className="px-3 py-2 font-bold">{a.name}</td>
              <td className="px-3 py-2">{a.employer}</td>
              <td className="px-3 py-2">{a.cardNumber}</td>
              <td className="px-3 py-2">{when(a.signedAt)}</td>
              <td className="px-3 py-2">
                {/* eslint-disable-next-line @next/next/no-img-element -- the stored signature, inline */}
                <img
                  src={`data:image/png;base64,${Buffer.from(a.signature).toString("base64")}`}
                  alt={`Signature of ${a.name}`}
                  className="h-10"
                />
              </td>
            </tr>
          ))}
        </DataTable>
      </div>
    </div>
  );
}
