/**
 * Scores one handling task with the methods its operation calls for, and reviews a whole revision
 * for what is missing. Pure: the wizard runs it in the browser as the user types; the server runs it
 * again on save and stores the result as a snapshot with the rules version.
 */
import { scoreLift, type LiftRequest, type LiftResult } from "../lift-plan/lift";
import { worstBand } from "../rules/bands";
import { scoreFilter, type FilterRequest, type FilterResult } from "../rules/filter";
import { scoreNiosh, type NioshRequest, type NioshResult } from "../rules/niosh";
import { scorePush, type PushRequest, type PushResult } from "../rules/push";
import type { Band } from "../rules/types";
import { RULES_VERSION } from "../rules/version";
import type { Content, Task } from "./content";
import { PERMIT_LABELS } from "./options";
import { solveForClear, type WhatIf } from "./what-if";

export interface RegisterEntry {
  id: string;
  name: string;
  massKg: number;
  grip: "good" | "fair" | "poor";
  massSource: "weighed" | "datasheet" | "estimated";
}

// A type, not an interface, so that Object.values() sees its members.
export type TaskResults = {
  niosh?: NioshResult;
  filter?: FilterResult;
  push?: PushResult;
  lift?: LiftResult;
};

export interface TaskScore {
  taskId: string;
  /** Null while the task lacks what its methods need. */
  band: Band | null;
  load: number | null;
  estimatedMass: boolean;
  incomplete: string[];
  results: TaskResults;
  /** Changes that would bring the task to Clear, each re-scored by the same engine. Absent in
   * snapshots scored before the solver existed. */
  whatIf?: WhatIf;
  rulesVersion: string;
}

export interface MethodRequests {
  niosh?: NioshRequest;
  filter?: FilterRequest;
  push?: PushRequest;
  lift?: LiftRequest;
}

/** The guideline filter's request from a task's filter inputs; `also` adds what the operation uses. */
function filterRequest(
  f: NonNullable<Task["filter"]>,
  load: number,
  conditions: Task["conditions"],
  also: Partial<FilterRequest>,
): FilterRequest {
  return {
    method: "filter",
    sex: f.sex,
    zone: f.zone,
    reach: f.reach,
    load,
    frequency: f.frequency,
    twistDeg: f.twistDeg,
    teamSize: f.teamSize,
    conditions,
    ...also,
  };
}

/**
 * The request each method gets for this task, built field by field so that every input a method
 * uses reaches it from where the task records it — and nothing left over from another operation
 * (a carry distance on a team lift, say). The wizard, the server, the API and the pack all score
 * through this one mapping.
 */
export function methodRequests(task: Task, load: number | null): MethodRequests {
  const out: MethodRequests = {};
  if (load === null && task.operation !== "push") return out;
  const f = task.filter;
  switch (task.operation) {
    case "lift": {
      const n = task.niosh;
      if (n)
        out.niosh = {
          method: "niosh",
          units: "metric",
          load: load!,
          origin: n.origin,
          destination: n.destination,
          frequency: n.frequency,
          durationHours: n.durationHours,
          recoveryHours: n.recoveryHours,
          coupling: n.coupling,
          controlAtDestination: n.controlAtDestination,
          conditions: task.conditions,
        };
      // One person: the filter takes the lift's own frequency and its largest twist.
      if (f)
        out.filter = filterRequest(f, load!, task.conditions, {
          frequency: n ? n.frequency : f.frequency,
          twistDeg: n ? Math.max(n.origin.a, n.destination.a) : f.twistDeg,
          teamSize: 1,
        });
      break;
    }
    case "team-lift":
      if (f) out.filter = filterRequest(f, load!, task.conditions, {});
      break;
    case "carry":
      if (f)
        out.filter = filterRequest(f, load!, task.conditions, {
          carryDistanceM: f.carryDistanceM,
          durationHours: f.durationHours,
        });
      break;
    case "push": {
      const p = task.push;
      if (p)
        out.push = {
          method: "push",
          mass: p.mass,
          gradient: p.gradient,
          rollingCoefficient: p.rollingCoefficient,
          sex: p.sex,
          teamSize: p.teamSize,
          distanceM: p.distanceM,
          measuredForceN: p.measuredForceN,
          surface: p.surface,
          braked: p.braked,
          brakeOperator: p.brakeOperator,
          conditions: task.conditions,
        };
      break;
    }
    case "equipment":
      if (task.lift) out.lift = { ...task.lift, method: "lift", load: load! };
      break;
  }
  return out;
}

/** Scores one task with every method its operation calls for; no what-if (see `scoreTask`). */
export function rateTask(task: Task, component: RegisterEntry | undefined): TaskScore {
  const incomplete: string[] = [];
  const results: TaskResults = {};
  if (!component) incomplete.push("choose a component from the load register");
  const load = component ? component.massKg * (task.quantity ?? 1) : null;
  const requests = methodRequests(task, load);

  switch (task.operation) {
    case "lift":
      if (!task.niosh) incomplete.push("enter the hand positions for the lifting equation");
      break;
    case "team-lift":
      if (!task.filter) incomplete.push("enter the team and hand-height zone");
      else if (task.filter.teamSize < 2) incomplete.push("a team lift needs at least 2 people");
      break;
    case "carry":
      if (!task.filter) incomplete.push("enter the carry distance and hand-height zone");
      else if (!task.filter.carryDistanceM) incomplete.push("enter the carry distance");
      break;
    case "push":
      if (!task.push) incomplete.push("enter the trolley mass and gradient");
      break;
    case "equipment":
      if (!task.lift) incomplete.push("complete the lift plan");
      break;
  }
  if (requests.niosh) results.niosh = scoreNiosh(requests.niosh);
  if (requests.filter) results.filter = scoreFilter(requests.filter);
  if (requests.push) {
    results.push = scorePush(requests.push);
    if (results.push.runsAway && requests.push.braked && !requests.push.brakeOperator?.trim())
      incomplete.push("name who works the trolley's brake");
  }
  if (requests.lift) {
    results.lift = scoreLift(requests.lift);
    if (results.lift.missing.length) incomplete.push(`lift plan: add the ${results.lift.missing.join(", ")}`);
  }

  const bands: Band[] = [];
  for (const r of [results.niosh, results.filter, results.push, results.lift]) if (r) bands.push(r.band);
  return {
    taskId: task.id,
    // Never better than the worst of the methods that apply.
    band: bands.length ? worstBand(bands) : null,
    load,
    estimatedMass: component?.massSource === "estimated",
    incomplete,
    results,
    rulesVersion: RULES_VERSION,
  };
}

/** Scores one task and works out what would bring it to Clear. Pure: the wizard runs it as the
 * user types; the server runs it again on save and stores it as a snapshot with the rules version. */
export function scoreTask(task: Task, component: RegisterEntry | undefined): TaskScore {
  const score = rateTask(task, component);
  score.whatIf = solveForClear(task, component, score);
  return score;
}

export interface ReviewItem {
  step: "scope" | "line" | "sequence" | "loads" | "hazards" | "people" | "ground" | "emergency";
  message: string;
}

/** Tasks that put the hands below the standing surface: lowering into or lifting out of an excavation. */
export function belowStandingLevelTasks(content: Content): Task[] {
  return content.tasks.filter(
    (t) =>
      t.filter?.zone === "below-standing-level" ||
      (t.operation === "lift" && t.niosh && (t.niosh.origin.v < 0 || t.niosh.destination.v < 0)),
  );
}

/**
 * What the lineside sections still lack. Blockers, not warnings: work on or near the line without a
 * protection arrangement and a responsible person with their competence; a permit listed without its
 * reference; digging without the checks for buried services; an excavation (or a task that lowers
 * into one) without its depth, support and inspection.
 */
export function linesideGaps(content: Content): ReviewItem[] {
  const out: ReviewItem[] = [];
  const l = content.lineside;
  if (l.nearLine !== "not-near") {
    if (!l.protection)
      out.push({ step: "line", message: "Choose the protection arrangement for working on or near the line." });
    else if (l.protection === "other" && !l.protectionDetail.trim())
      out.push({ step: "line", message: "Describe the protection arrangement." });
    if (!l.responsibleName.trim())
      out.push({ step: "line", message: "Name the person responsible for the safe system of work." });
    if (!l.responsibleCompetence.trim())
      out.push({
        step: "line",
        message: "Give the competence reference of the person responsible for the safe system of work.",
      });
    if (!l.positionsOfSafety.trim()) out.push({ step: "line", message: "Say where the positions of safety are." });
  }
  content.permits.forEach((p, i) => {
    const name = p.kind === "other" ? p.description.trim() || `Permit ${i + 1}` : PERMIT_LABELS[p.kind];
    if (p.kind === "other" && !p.description.trim())
      out.push({ step: "ground", message: `Permit ${i + 1}: say which permit it is.` });
    if (!p.reference.trim())
      out.push({ step: "ground", message: `${name}: the permit is listed as needed but has no reference.` });
    if (!p.issuedBy.trim()) out.push({ step: "ground", message: `${name}: say who issues it.` });
  });
  const below = belowStandingLevelTasks(content);
  const digging = content.excavation.present || content.permits.some((p) => p.kind === "dig") || below.length > 0;
  if (digging) {
    const b = content.buriedServices;
    if (!b.recordsObtained)
      out.push({
        step: "ground",
        message: "Buried services: record that the service records were obtained before digging.",
      });
    if (!b.scanned)
      out.push({
        step: "ground",
        message: "Buried services: record the scan with a cable locating tool before digging.",
      });
    else if (!b.scannedBy.trim() || !b.scanDate)
      out.push({ step: "ground", message: "Buried services: say who scanned, and when." });
    if (!b.rule.trim())
      out.push({ step: "ground", message: "Buried services: state the rule the gang follows near a located service." });
  }
  if (below.length && !content.excavation.present)
    out.push({
      step: "ground",
      message: `${below.length === 1 ? "A task lowers" : `${below.length} tasks lower`} a load below the standing surface: describe the excavation it goes into.`,
    });
  if (content.excavation.present) {
    const e = content.excavation;
    if (e.depthM === null) out.push({ step: "ground", message: "Excavation: give its depth." });
    if (!e.support) out.push({ step: "ground", message: "Excavation: say how its sides are supported or battered." });
    else if (e.support === "other" && !e.supportDetail.trim())
      out.push({ step: "ground", message: "Excavation: describe the support." });
    if (!e.inspection.trim())
      out.push({
        step: "ground",
        message: "Excavation: say who inspects it, before each shift and after anything that could weaken it.",
      });
    if (!e.accessEgress.trim()) out.push({ step: "ground", message: "Excavation: describe the safe way in and out." });
  }
  return out;
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
  if (!content.sequence.some((s) => s.text.trim()))
    missing.push({ step: "sequence", message: "Add at least one step to the sequence of work." });
  if (content.tasks.length === 0) missing.push({ step: "loads", message: "Add at least one handling task." });
  content.tasks.forEach((task, i) => {
    const s = scores[i];
    const name = task.description.trim() || `Task ${i + 1}`;
    for (const item of s.incomplete) missing.push({ step: "loads", message: `${name}: ${item}.` });
    if (s.band === "stop")
      missing.push({ step: "loads", message: `${name} is banded Stop: redesign it before submitting.` });
  });
  if (content.hazards.length === 0)
    missing.push({ step: "hazards", message: "Record at least one hazard with its controls." });
  content.hazards.forEach((h, i) => {
    if (h.controls.length === 0)
      missing.push({ step: "hazards", message: `Hazard ${i + 1} (${h.hazard || "unnamed"}) has no controls.` });
  });
  if (!content.people.roles.some((r) => r.name.trim()))
    missing.push({ step: "people", message: "Name the people and their roles." });
  if (!content.people.ppe.some((p) => p.trim())) missing.push({ step: "people", message: "List the PPE required." });
  if (!content.emergency.arrangements.trim())
    missing.push({ step: "emergency", message: "Describe the emergency arrangements." });
  if (!content.emergency.nearestHospital.trim())
    missing.push({ step: "emergency", message: "Name the nearest hospital with an emergency department." });
  missing.push(...linesideGaps(content));
  const banded = scores.map((s) => s.band).filter((b): b is Band => b !== null);
  return { missing, worstBand: banded.length ? worstBand(banded) : null, scores, canSubmit: missing.length === 0 };
}

/** The wizard step where each part of the content is edited. */
const STEP_OF_PART: Record<keyof Content, ReviewItem["step"]> = {
  scope: "scope",
  sequence: "sequence",
  tasks: "loads",
  hazards: "hazards",
  people: "people",
  emergency: "emergency",
  environment: "emergency",
  lineside: "line",
  permits: "ground",
  buriedServices: "ground",
  excavation: "ground",
};

/**
 * The review of a draft whose fields do not pass the content schema (the paths of its problems, as
 * the schema reports them). Nothing is judged: no band, so never Clear, and nothing can be submitted
 * until each step named has its marked fields corrected.
 */
export function reviewOfInvalid(problemPaths: readonly (readonly PropertyKey[])[]): Review {
  const steps = new Set(problemPaths.map((p) => STEP_OF_PART[p[0] as keyof Content] ?? "scope"));
  const missing = [...steps].map((step) => ({
    step,
    message: "Correct the fields marked in red: until then no task is judged.",
  }));
  return { missing, worstBand: null, scores: [], canSubmit: false };
}

export interface Rescored {
  taskId: string;
  /** 1-based position of the task in the revision. */
  position: number;
  description: string;
  was: Band | null;
  now: Band | null;
  wasVersion: string;
}

/**
 * Tasks whose stored result (saved under earlier rules) the current rules score differently: a
 * different band, or a different index from any method. A draft shows these before it is submitted;
 * approved revisions keep their stored results and are never re-scored.
 */
export function rescoredByCurrentRules(
  tasks: Task[],
  stored: readonly TaskScore[] | null,
  fresh: readonly TaskScore[],
): Rescored[] {
  if (!stored) return [];
  const byId = new Map(stored.map((s) => [s.taskId, s]));
  const out: Rescored[] = [];
  fresh.forEach((now, i) => {
    const was = byId.get(now.taskId);
    if (!was || was.rulesVersion === now.rulesVersion) return;
    const indexOf = (s: TaskScore, m: keyof TaskResults) => {
      const x = s.results[m]?.index;
      return x === undefined || x === null ? x : Math.round(x * 100);
    };
    const methods: (keyof TaskResults)[] = ["niosh", "filter", "push", "lift"];
    if (was.band !== now.band || methods.some((m) => indexOf(was, m) !== indexOf(now, m)))
      out.push({
        taskId: now.taskId,
        position: i + 1,
        description: tasks[i]?.description ?? "",
        was: was.band,
        now: now.band,
        wasVersion: was.rulesVersion,
      });
  });
  return out;
}
