import { BandChip } from "@/app/_components/results/band";
import { TaskResult } from "@/app/_components/results/task-result";
import { CONTROL_LEVEL_LABELS, OPERATION_LABELS, riskRating, type Content } from "@/assessments/method-statement/content";
import type { TaskScore } from "@/assessments/method-statement/score-task";
import type { Band } from "@/assessments/rules/types";

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="space-y-2 rounded-lg border border-rule bg-white p-4">
      <h2 className="text-xl font-bold">{title}</h2>
      {children}
    </section>
  );
}

/** Everything in a revision, read-only, with the results as they were saved. */
export function ReadOnlyRevision({ content, scores, worstBand }: { content: Content; scores: TaskScore[]; worstBand: Band | null }) {
  return (
    <div className="space-y-4">
      <div className="flex items-center gap-2">
        <span className="font-bold">Worst band:</span> <BandChip band={worstBand} large />
      </div>
      <Section title="Scope">
        <p className="whitespace-pre-line">{content.scope.summary || "—"}</p>
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
      <Section title="Emergency & environment">
        <p>
          <strong>Nearest hospital (emergency department):</strong> {content.emergency.nearestHospital || "—"}
        </p>
        <p className="whitespace-pre-line">{content.emergency.arrangements}</p>
        <p className="whitespace-pre-line text-muted">{content.emergency.environment}</p>
      </Section>
    </div>
  );
}
