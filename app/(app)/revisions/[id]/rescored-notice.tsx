import { BandChip } from "@/app/_components/results/band";
import type { Rescored } from "@/assessments/method-statement/score-task";
import { RULES_VERSION } from "@/assessments/rules/version";

/** A draft saved under earlier rules: the tasks the current rules score differently, before anything is submitted. */
export function RescoredNotice({ tasks }: { tasks: Rescored[] }) {
  if (tasks.length === 0) return null;
  return (
    <section
      role="status"
      aria-label="Rules changed"
      className="rounded-lg border-l-4 border-band-act bg-white p-4"
      data-testid="rescored-notice"
    >
      <h2 className="font-bold">The scoring rules have changed since this draft was saved</h2>
      <p className="text-sm">
        These tasks were scored under rules {[...new Set(tasks.map((t) => t.wasVersion))].join(", ")} and are scored
        differently under rules {RULES_VERSION}. The results shown below are the new ones; check each task before you
        submit. Saving the draft stores the new results.
      </p>
      <ul className="mt-2 space-y-1 text-sm">
        {tasks.map((t) => (
          <li key={t.taskId} className="flex flex-wrap items-center gap-2">
            <strong>
              Task {t.position}
              {t.description ? `: ${t.description}` : ""}
            </strong>
            <span>was</span> <BandChip band={t.was} /> <span>now</span> <BandChip band={t.now} />
          </li>
        ))}
      </ul>
    </section>
  );
}
