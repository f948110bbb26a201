/**
 * Scores one handling task with the methods its operation calls for, and reviews a whole revision
 * for what is missing. Pure: the wizard runs it in the browser as the user types; the server runs it
 * again on save and stores the result as a snapshot with the rules version.
 */
import { scoreLift, type LiftResult } from "../lift-plan/lift";
import { worstBand } from "../rules/bands";
import { scoreFilter, type FilterResult } from "../rules/filter";
import { scoreNiosh, type NioshResult } from "../rules/niosh";
import { scorePush, type PushResult } from "../rules/push";
import type { Band } from "../rules/types";
import { RULES_VERSION } from "../rules/version";
import type { Content, Task } from "./content";

export interface RegisterEntry {
  id: string;
  name: string;
  massKg: number;
  grip: "good" | "fair" | "poor";
  massSource: "weighed" | "datasheet" | "estimated";
}

export interface TaskScore {
  taskId: string;
  /** Null while the task lacks what its methods need. */
  band: Band | null;
  load: number | null;
  estimatedMass: boolean;
  incomplete: string[];
  results: { niosh?: NioshResult; filter?: FilterResult; push?: PushResult; lift?: LiftResult };
  rulesVersion: string;
}

export function scoreTask(task: Task, component: RegisterEntry | undefined): TaskScore {
  const incomplete: string[] = [];
  const results: TaskScore["results"] = {};
  if (!component) incomplete.push("choose a component from the load register");
  const load = component ? component.massKg * (task.quantity ?? 1) : null;

  const need = (what: keyof TaskScore["results"], label: string) => {
    if (!task[what]) incomplete.push(label);
    return !!task[what] && load !== null;
  };

  switch (task.operation) {
    case "lift":
      if (need("niosh", "enter the hand positions for the lifting equation")) results.niosh = scoreNiosh({ method: "niosh", units: "metric", load: load!, ...task.niosh! });
      if (task.filter && load !== null) results.filter = scoreFilter({ method: "filter", load, ...task.filter, teamSize: 1 });
      break;
    case "team-lift":
      if (need("filter", "enter the team and hand-height zone")) results.filter = scoreFilter({ method: "filter", load: load!, ...task.filter! });
      if (task.filter && task.filter.teamSize < 2) incomplete.push("a team lift needs at least 2 people");
      break;
    case "carry":
      if (need("filter", "enter the carry distance and hand-height zone")) results.filter = scoreFilter({ method: "filter", load: load!, ...task.filter! });
      if (task.filter && !task.filter.carryDistanceM) incomplete.push("enter the carry distance");
      break;
    case "push":
      if (!task.push) incomplete.push("enter the trolley mass and gradient");
      else results.push = scorePush({ method: "push", ...task.push });
      break;
    case "equipment":
      if (need("lift", "complete the lift plan")) results.lift = scoreLift({ method: "lift", load: load!, ...task.lift! });
      if (results.lift?.missing.length) incomplete.push(`lift plan: add the ${results.lift.missing.join(", ")}`);
      break;
  }

  const bands = Object.values(results).map((r) => r.band);
  return {
    taskId: task.id,
    band: bands.length ? worstBand(bands) : null,
    load,
    estimatedMass: component?.massSource === "estimated",
    incomplete,
    results,
    rulesVersion: RULES_VERSION,
  };
}

export interface ReviewItem {
  step: "scope" | "sequence" | "loads" | "hazards" | "people" | "emergency";
  message: string;
}

export interface Review {
  missing: ReviewItem[];
  worstBand: Band | null;
  scores: TaskScore[];
  canSubmit: boolean;
}

/** What stops this revision from being submitted, and the worst band of its tasks. */
export function reviewContent(content: Content, register: RegisterEntry[]): Review {
  const byId = new Map(register.map((c) => [c.id, c]));
  const scores = content.tasks.map((t) => scoreTask(t, t.componentId ? byId.get(t.componentId) : undefined));
  const missing: ReviewItem[] = [];
  if (!content.scope.summary.trim()) missing.push({ step: "scope", message: "Describe the scope of the work." });
  if (!content.sequence.some((s) => s.text.trim())) missing.push({ step: "sequence", message: "Add at least one step to the sequence of work." });
  if (content.tasks.length === 0) missing.push({ step: "loads", message: "Add at least one handling task." });
  content.tasks.forEach((task, i) => {
    const s = scores[i];
    const name = task.description.trim() || `Task ${i + 1}`;
    for (const item of s.incomplete) missing.push({ step: "loads", message: `${name}: ${item}.` });
    if (s.band === "stop") missing.push({ step: "loads", message: `${name} is banded Stop: redesign it before submitting.` });
  });
  if (content.hazards.length === 0) missing.push({ step: "hazards", message: "Record at least one hazard with its controls." });
  content.hazards.forEach((h, i) => {
    if (h.controls.length === 0) missing.push({ step: "hazards", message: `Hazard ${i + 1} (${h.hazard || "unnamed"}) has no controls.` });
  });
  if (!content.people.roles.some((r) => r.name.trim())) missing.push({ step: "people", message: "Name the people and their roles." });
  if (!content.people.ppe.some((p) => p.trim())) missing.push({ step: "people", message: "List the PPE required." });
  if (!content.emergency.arrangements.trim()) missing.push({ step: "emergency", message: "Describe the emergency arrangements." });
  if (!content.emergency.nearestHospital.trim()) missing.push({ step: "emergency", message: "Name the nearest hospital with an emergency department." });
  const banded = scores.map((s) => s.band).filter((b): b is Band => b !== null);
  return { missing, worstBand: banded.length ? worstBand(banded) : null, scores, canSubmit: missing.length === 0 };
}
