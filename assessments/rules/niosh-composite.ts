/**
 * Composite lifting index (CLI) for a job of 2–10 lifting tasks done by the same worker,
 * by the multi-task procedure of the NIOSH Applications Manual (§2.4):
 *
 *   FIRWL = RWL with FM = 1;  STRWL = FIRWL × FM(task's own F)
 *   FILI = L / FIRWL;         STLI = L / STRWL
 *   tasks ordered by decreasing STLI;
 *   CLI = STLI₁ + Σ_{k≥2} FILI_k × (1/FM(F₁+…+F_k) − 1/FM(F₁+…+F_{k−1}))
 *
 * FM of a cumulative frequency is read at the job's duration. Heftwise policy where the manual
 * leaves a choice: a task with significant control at the destination uses whichever end gives the
 * lower FIRWL; the V column of a cumulative FM is "V < 75 cm" (the lower, more conservative
 * multiplier) if any task in the sum is lifted below 75 cm (30 in).
 */
import { bandForIndex, NIOSH_THRESHOLDS } from "./bands";
import {
  asymmetricMultiplier,
  couplingMultiplier,
  distanceMultiplier,
  horizontalMultiplier,
  rangeWarnings,
  unitSystem,
  verticalMultiplier,
  type HandPosition,
  type UnitSystem,
} from "./niosh";
import { durationBand, frequencyMultiplier, MIN_FREQUENCY } from "./niosh-frequency";
import { fmt } from "./format";
import { SOURCES } from "./sources";
import type { Coupling, ResultBase, Units, Warning } from "./types";
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
  tasks: CompositeTaskRequest[];
}

export interface CompositeTaskResult {
  id: string;
  firwl: number;
  strwl: number;
  fili: number | null;
  stli: number | null;
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
  const duration = durationBand(req.durationHours);
  const warnings: Warning[] = [];

  const scored: OrderedTask[] = [];
  for (let i = 0; i < req.tasks.length; i++) {
    const task = req.tasks[i];
    const taskWarnings = rangeWarnings(task.origin, task.destination, task.frequency, req.durationHours, u, `tasks.${i}.`);
    for (const w of taskWarnings) warnings.push(w);
    const travel = Math.abs(task.destination.v - task.origin.v);
    // With significant control at the destination, the end with the lower FIRWL is used.
    let firwl = freeIndexLimit(task.origin, travel, task.coupling, u);
    let lowV = task.origin.v < u.vColumnSplit;
    if (task.controlAtDestination) {
      const atDestination = freeIndexLimit(task.destination, travel, task.coupling, u);
      if (atDestination < firwl) {
        firwl = atDestination;
        lowV = task.destination.v < u.vColumnSplit;
      }
    }
    const strwl = firwl * frequencyMultiplier(task.frequency, duration, !lowV);
    scored.push({
      result: { id: task.id, firwl, strwl, fili: firwl > 0 ? task.load / firwl : null, stli: strwl > 0 ? task.load / strwl : null },
      frequency: Math.max(task.frequency, MIN_FREQUENCY),
      lowV,
    });
  }

  const outOfRange = scored.some((s) => s.result.stli === null);
  // Tasks outside the equation's range sort first: they decide the job.
  const ordered = [...scored].sort(
    (a, b) => (b.result.stli ?? Infinity) - (a.result.stli ?? Infinity),
  );

  let cli: number | null = null;
  if (!outOfRange) {
    const combined = combineIndices(ordered, duration);
    cli = combined.cli;
    if (combined.overflowFrequency !== undefined)
      warnings.push({
        field: "tasks",
        message: `The tasks' combined frequency reaches ${fmt(combined.overflowFrequency)}/min, where FM is 0: the equation cannot judge this job.`,
      });
  }

  const band = bandForIndex(cli, NIOSH_THRESHOLDS);
  const first = ordered[0]?.result;
  return {
    method: "niosh-composite",
    inputs: { method: "niosh-composite", units: req.units, durationHours: req.durationHours, tasks: req.tasks, durationBand: duration },
    cli,
    index: cli,
    order: ordered.map((s) => s.result.id),
    tasks: scored.map((s) => s.result),
    band,
    reasons:
      cli === null
        ? [
            {
              text: "At least one task, or the tasks' combined frequency, is outside the range the NIOSH equation can judge: no composite index is given. Do not proceed as planned.",
              source: SOURCES.nioshComposite,
            },
          ]
        : [
            {
              text: `Composite lifting index ${fmt(cli)} for ${req.tasks.length} tasks; task "${first.id}" is the most stressful on its own (STLI ${fmt(first.stli!)}).`,
              source: SOURCES.nioshComposite,
            },
            {
              text:
                band === "clear"
                  ? "Composite index at or below 1.0: nominal risk for nearly all healthy workers."
                  : band === "stop"
                    ? "Composite index above 3.0: nearly all workers are at increased risk."
                    : `Composite index above 1.0: increased risk for some workers (Heftwise: watch up to ${NIOSH_THRESHOLDS.watchUpTo}, act up to 3.0).`,
              source: band === "clear" || band === "stop" ? SOURCES.nioshManual : `${SOURCES.nioshManual}; ${SOURCES.heftwisePolicy}`,
            },
          ],
    warnings,
    rulesVersion: RULES_VERSION,
  };
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
