/** Copying a library hazard into an assessment. No zod here: the wizard's hazards step imports it while the page loads. */
import type { LibraryEntry } from "./schemas";

/** A copy of a library hazard for an assessment: its own id, controls copied, ready to change for the job. */
export function hazardFromLibrary(entry: LibraryEntry, id: string) {
  return {
    id,
    hazard: entry.hazard,
    whoIsAtRisk: entry.whoIsAtRisk,
    likelihoodBefore: entry.likelihoodBefore,
    severityBefore: entry.severityBefore,
    controls: entry.controls.map((c) => ({ ...c })),
    likelihoodAfter: entry.likelihoodAfter,
    severityAfter: entry.severityAfter,
  };
}
