import { BandChip } from "@/app/_components/results/band";
import { TaskResult } from "@/app/_components/results/task-result";
import type { Content } from "@/assessments/method-statement/content";
import { CONTROL_LEVEL_LABELS, OPERATION_LABELS, riskRating } from "@/assessments/method-statement/options";
import type { TaskScore } from "@/assessments/method-statement/score-task";
import type { Band } from "@/assessments/rules/types";
import { NEAR_LINE_LABELS } from "@/assessments/method-statement/options";
import {
  buriedServicesRows,
  environmentRows,
  excavationRows,
  LINE_CAUTION,
  lineRows,
  permitRows,
} from "@/assessments/method-statement/lineside";

function Rows({ rows }: { rows: [string, string][] }) {
  return (
    <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[16rem_1fr]">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="font-bold">{k}</dt>
          <dd className="whitespace-pre-line">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="space-y-2 rounded-lg border border-rule bg-white p-4">
      <h2 className="text-xl font-bold">{title}</h2>
      {children}
    </section>
  );
}

/** Everything in a revision, read-only, with the results as they were saved. */
export function ReadOnlyRevision({
  content,
  scores,
  worstBand,
}: {
  content: Content;
  scores: TaskScore[];
  worstBand: Band | null;
}) {
  return (
    <div className="space-y-4">
      <div className="flex items-center gap-2">
        <span className="font-bold">Worst band:</span> <BandChip band={worstBand} large />
      </div>
      <Section title="Scope">
        <p className="whitespace-pre-line">{content.scope.summary || "—"}</p>
      </Section>
      <Section title="Near the line">
        {lineRows(content) ? (
          <>
            <Rows rows={lineRows(content)!} />
            <p className="text-sm text-muted">{LINE_CAUTION}</p>
          </>
        ) : (
          <p>{NEAR_LINE_LABELS[content.lineside.nearLine]}</p>
        )}
      </Section>
      <Section title="Sequence of work">
        <ol className="list-decimal pl-6">
          {content.sequence.map((s) => (
            <li key={s.id}>{s.text}</li>
          ))}
        </ol>
      </Section>
      {content.tasks.map((t, i) => (
        <Section key={t.id} title={`Task ${i + 1}: ${t.description || OPERATION_LABELS[t.operation]}`}>
          <p className="text-sm text-muted">{OPERATION_LABELS[t.operation]}</p>
          {scores[i] ? <TaskResult score={scores[i]} /> : <p className="text-muted">Not scored.</p>}
        </Section>
      ))}
      <Section title="Hazards & controls">
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <thead className="bg-paper">
              <tr>
                <th className="px-2 py-1">Hazard</th>
                <th className="px-2 py-1">Who</th>
                <th className="px-2 py-1">Before</th>
                <th className="px-2 py-1">Controls</th>
                <th className="px-2 py-1">After</th>
              </tr>
            </thead>
            <tbody>
              {content.hazards.map((h) => (
                <tr key={h.id} className="border-t border-rule align-top">
                  <td className="px-2 py-1">{h.hazard}</td>
                  <td className="px-2 py-1">{h.whoIsAtRisk}</td>
                  <td className="px-2 py-1 tabular-nums">{riskRating(h.likelihoodBefore, h.severityBefore)}</td>
                  <td className="px-2 py-1">
                    <ul>
                      {h.controls.map((c, j) => (
                        <li key={j}>
                          <strong>{CONTROL_LEVEL_LABELS[c.level]}:</strong> {c.text}
                        </li>
                      ))}
                    </ul>
                  </td>
                  <td className="px-2 py-1 tabular-nums">{riskRating(h.likelihoodAfter, h.severityAfter)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Section>
      <Section title="People, plant & PPE">
        <ul>
          {content.people.roles.map((r, i) => (
            <li key={i}>
              <strong>{r.role}:</strong> {r.name} {r.competence && <span className="text-muted">({r.competence})</span>}
            </li>
          ))}
        </ul>
        <p>
          <strong>Plant:</strong> {content.people.plant.filter(Boolean).join("; ") || "—"}
        </p>
        <p>
          <strong>PPE:</strong> {content.people.ppe.filter(Boolean).join("; ") || "—"}
        </p>
      </Section>
      <Section title="Permits, services & digging">
        <h3 className="font-bold">Permits</h3>
        {content.permits.length ? (
          <ul>
            {permitRows(content).map(([name, ref, by, valid], i) => (
              <li key={i}>
                <strong>{name}:</strong> {ref} · issued by {by} · valid {valid}
              </li>
            ))}
          </ul>
        ) : (
          <p>None listed.</p>
        )}
        <h3 className="font-bold">Buried services</h3>
        <Rows rows={buriedServicesRows(content)} />
        <h3 className="font-bold">Excavation</h3>
        {excavationRows(content) ? <Rows rows={excavationRows(content)!} /> : <p>No excavation.</p>}
      </Section>
      <Section title="Emergency & environment">
        <p>
          <strong>Nearest hospital (emergency department):</strong> {content.emergency.nearestHospital || "—"}
        </p>
        <p className="whitespace-pre-line">{content.emergency.arrangements}</p>
        <Rows rows={environmentRows(content)} />
      </Section>
    </div>
  );
}
