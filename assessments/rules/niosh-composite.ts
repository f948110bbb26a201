/**
 * Composite lifting index (CLI) for a job of 2–10 lifting tasks done by the same worker,
 * by the multi-task procedure of the NIOSH Applications Manual (§2.4):
 *
 *   FIRWL = RWL with FM = 1;  STRWL = FIRWL × FM(task's own F)
 *   FILI = L / FIRWL;         STLI = L / STRWL
 *   tasks ordered by decreasing STLI;
 *   CLI = STLI₁ + Σ_{k≥2} FILI_k × (1/FM(F₁+…+F_k) − 1/FM(F₁+…+F_{k−1}))
 *
 * FM of a cumulative frequency is read at the job's duration category (with its recovery time, as
 * for a single task). Heftwise policy where the manual leaves a choice:
 * - a task with significant control at the destination uses the end with the larger STLI (its own
 *   frequency's FM read in that end's V column), so a zero cell at either end is never dropped;
 * - the V column of a cumulative FM is "V < 75 cm" (the lower, more conservative multiplier) if any
 *   task in the sum is lifted below 75 cm (30 in);
 * - a task lifted less often than 0.2/min is added to the cumulative frequency at 0.2/min, as the
 *   manual takes it for a single task: a higher cumulative frequency only lowers FM, so this is
 *   conservative;
 * - the job is never banded better than any of its tasks scored alone: a task the single-task
 *   method stops keeps the job at Stop, named.
 */
import { bandForIndex, NIOSH_THRESHOLDS, worstBand } from "./bands";
import {
  asymmetricMultiplier,
  couplingMultiplier,
  distanceMultiplier,
  horizontalMultiplier,
  rangeWarnings,
  unitSystem,
  vColumnLabel,
  verticalMultiplier,
  type HandPosition,
  type UnitSystem,
} from "./niosh";
import { durationBand, frequencyMultiplier, MIN_FREQUENCY, zeroFrequencyExplanation } from "./niosh-frequency";
import { fmt } from "./format";
import { SOURCES } from "./sources";
import type { Band, Coupling, Reason, ResultBase, Units, Warning } from "./types";
import { RULES_VERSION } from "./version";

export const MIN_COMPOSITE_TASKS = 2;
export const MAX_COMPOSITE_TASKS = 10;

export interface CompositeTaskRequest {
  id: string;
  load: number;
  origin: HandPosition;
  destination: HandPosition;
  frequency: number;
  coupling: Coupling;
  controlAtDestination: boolean;
}

export interface CompositeRequest {
  method: "niosh-composite";
  units: Units;
  durationHours: number;
  /** Rest or light work that follows the job (hours): decides the duration category. */
  recoveryHours?: number;
  tasks: CompositeTaskRequest[];
}

export interface CompositeTaskResult {
  id: string;
  firwl: number;
  strwl: number;
  fili: number | null;
  stli: number | null;
  /** The end whose limit is used: the destination only with significant control there. */
  end: "origin" | "destination";
  /** The task's band scored alone (its STLI, or stop where the equation cannot judge it). */
  band: Band;
}

export interface CompositeResult extends ResultBase {
  method: "niosh-composite";
  inputs: CompositeRequest & { durationBand: string };
  cli: number | null;
  index: number | null;
  order: string[];
  tasks: CompositeTaskResult[];
}

export function scoreComposite(req: CompositeRequest): CompositeResult {
  const u = unitSystem(req.units);
  const duration = durationBand(req.durationHours, req.recoveryHours);
  const warnings: Warning[] = [];

  const scored: OrderedTask[] = [];
  for (let i = 0; i < req.tasks.length; i++) {
    const task = req.tasks[i];
    const taskWarnings = rangeWarnings(
      task.origin,
      task.destination,
      task.frequency,
      req.durationHours,
      req.recoveryHours,
      u,
      `tasks.${i}.`,
    );
    let judgeable = true;
    for (const w of taskWarnings) {
      // The duration is the job's: say it once, not per task.
      if (w.field.endsWith("recoveryHours") || w.field.endsWith("durationHours")) continue;
      if (w.cannotJudge) judgeable = false;
      warnings.push(w);
    }
    const travel = Math.abs(task.destination.v - task.origin.v);
    const origin = endLimits(task.origin, travel, task, duration, u);
    // With significant control at the destination, the end with the larger STLI (smaller STRWL)
    // governs; a zero FM at either end is kept.
    const chosen = task.controlAtDestination
      ? worseEnd(origin, endLimits(task.destination, travel, task, duration, u))
      : origin;
    if (chosen.strwl <= 0 && judgeable) {
      judgeable = false;
      const high = !chosen.lowV;
      warnings.push({
        field: `tasks.${i}.frequency`,
        message: `Task "${task.id}": FM is 0 at the ${chosen.end}. ${zeroFrequencyExplanation(task.frequency, duration, high, vColumnLabel(high, u))}`,
        cannotJudge: true,
      });
    }
    const stli = judgeable && chosen.strwl > 0 ? task.load / chosen.strwl : null;
    scored.push({
      result: {
        id: task.id,
        firwl: chosen.firwl,
        strwl: chosen.strwl,
        fili: chosen.firwl > 0 ? task.load / chosen.firwl : null,
        stli,
        end: chosen.end,
        band: bandForIndex(stli, NIOSH_THRESHOLDS),
      },
      frequency: Math.max(task.frequency, MIN_FREQUENCY),
      lowV: chosen.lowV,
    });
  }
  for (const w of rangeWarnings(
    req.tasks[0].origin,
    req.tasks[0].origin,
    MIN_FREQUENCY,
    req.durationHours,
    req.recoveryHours,
    u,
  ))
    if (w.field === "recoveryHours" || w.field === "durationHours") warnings.push(w);

  const outOfRange = scored.some((s) => s.result.stli === null);
  // Tasks outside the equation's range sort first: they decide the job.
  const ordered = [...scored].sort((a, b) => (b.result.stli ?? Infinity) - (a.result.stli ?? Infinity));

  let cli: number | null = null;
  if (!outOfRange) {
    const combined = combineIndices(ordered, duration);
    cli = combined.cli;
    if (combined.overflowFrequency !== undefined)
      warnings.push({
        field: "tasks",
        message: `The tasks' combined frequency reaches ${fmt(combined.overflowFrequency)}/min, where FM is 0 for this duration: the equation cannot judge this job. Spread the tasks over more people or more time.`,
        cannotJudge: true,
      });
  }

  // Never better than any task alone.
  const band = worstBand([bandForIndex(cli, NIOSH_THRESHOLDS), ...scored.map((s) => s.result.band)]);
  const reasons: Reason[] = [];
  const first = ordered[0].result;
  if (cli === null)
    reasons.push({
      text: "At least one task, or the tasks' combined frequency, is outside the range the NIOSH equation can judge: no composite index is given and the job is never Clear. Do not proceed as planned.",
      source: SOURCES.nioshComposite,
    });
  else
    reasons.push(
      {
        text: `Composite lifting index ${fmt(cli)} for ${req.tasks.length} tasks; task "${first.id}" is the most stressful on its own (STLI ${fmt(first.stli!)}).`,
        source: SOURCES.nioshComposite,
      },
      {
        text:
          band === "clear"
            ? "Composite index at or below 1.0: nominal risk for nearly all healthy workers."
            : bandForIndex(cli, NIOSH_THRESHOLDS) === "stop"
              ? "Composite index above 3.0: nearly all workers are at increased risk."
              : `Composite index above 1.0: increased risk for some workers (Heftwise: watch up to ${NIOSH_THRESHOLDS.watchUpTo}, act up to 3.0).`,
        source: band === "clear" ? SOURCES.nioshManual : `${SOURCES.nioshManual}; ${SOURCES.heftwisePolicy}`,
      },
    );
  for (const s of scored)
    if (s.result.band === "stop")
      reasons.push({
        text:
          s.result.stli === null
            ? `Task "${s.result.id}" is outside the range the equation can judge (see the warnings): the job stays at Stop until it is changed.`
            : `Task "${s.result.id}" alone has a lifting index of ${fmt(s.result.stli)}, banded Stop: the job stays at Stop until it is changed.`,
        source: `${SOURCES.nioshComposite}; job never better than its tasks: ${SOURCES.heftwisePolicy}`,
      });
  const infrequent = req.tasks.filter((t) => t.frequency < MIN_FREQUENCY).map((t) => `"${t.id}"`);
  if (infrequent.length)
    reasons.push({
      text: `Task${infrequent.length > 1 ? "s" : ""} ${infrequent.join(", ")} ${infrequent.length > 1 ? "are" : "is"} lifted less often than 0.2/min and counted at 0.2/min in the combined frequency, as the manual takes a single task; counting more lifts can only lower FM, so this is conservative.`,
      source: `${SOURCES.nioshManual}; applied to the combined frequency: ${SOURCES.heftwisePolicy}`,
    });

  return {
    method: "niosh-composite",
    inputs: { ...req, durationBand: duration },
    cli,
    index: cli,
    order: ordered.map((s) => s.result.id),
    tasks: scored.map((s) => s.result),
    band,
    reasons,
    warnings,
    rulesVersion: RULES_VERSION,
  };
}

interface EndLimits {
  end: "origin" | "destination";
  firwl: number;
  strwl: number;
  lowV: boolean;
}

function endLimits(
  pos: HandPosition,
  travel: number,
  task: CompositeTaskRequest,
  duration: ReturnType<typeof durationBand>,
  u: UnitSystem,
): EndLimits {
  const firwl = freeIndexLimit(pos, travel, task.coupling, u);
  const lowV = pos.v < u.vColumnSplit;
  return {
    end: pos === task.origin ? "origin" : "destination",
    firwl,
    strwl: firwl * frequencyMultiplier(task.frequency, duration, !lowV),
    lowV,
  };
}

/** The end with the smaller STRWL; on a tie, the smaller FIRWL. */
function worseEnd(a: EndLimits, b: EndLimits): EndLimits {
  if (b.strwl < a.strwl) return b;
  if (b.strwl === a.strwl && b.firwl < a.firwl) return b;
  return a;
}

/** FIRWL: the RWL with FM = 1. */
function freeIndexLimit(pos: HandPosition, travel: number, coupling: Coupling, u: UnitSystem): number {
  return (
    u.loadConstant *
    horizontalMultiplier(pos.h, u) *
    verticalMultiplier(pos.v, u) *
    distanceMultiplier(travel, u) *
    asymmetricMultiplier(pos.a) *
    couplingMultiplier(coupling, pos.v, u)
  );
}

interface OrderedTask {
  result: CompositeTaskResult;
  frequency: number;
  lowV: boolean;
}

/** CLI = STLI₁ + Σ FILI_k × (1/FM(F₁..F_k) − 1/FM(F₁..F_{k−1})), tasks already in STLI order. */
function combineIndices(
  ordered: OrderedTask[],
  duration: ReturnType<typeof durationBand>,
): { cli: number | null; overflowFrequency?: number } {
  let cli = ordered[0].result.stli!;
  let cumulativeF = ordered[0].frequency;
  let anyLowV = ordered[0].lowV;
  let previousFm = frequencyMultiplier(cumulativeF, duration, !anyLowV);
  for (let k = 1; k < ordered.length; k++) {
    cumulativeF += ordered[k].frequency;
    anyLowV = anyLowV || ordered[k].lowV;
    const fm = frequencyMultiplier(cumulativeF, duration, !anyLowV);
    if (fm <= 0) return { cli: null, overflowFrequency: cumulativeF };
    cli += ordered[k].result.fili! * (1 / fm - 1 / previousFm);
    previousFm = fm;
  }
  return { cli };
}
