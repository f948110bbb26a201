/**
 * Revised NIOSH Lifting Equation (Waters, Putz-Anderson, Garg; NIOSH Pub. 94-110).
 *
 *   RWL = LC × HM × VM × DM × AM × FM × CM,   LI = load ÷ RWL
 *
 * Both published unit systems are implemented as published (metric cm/kg, LC 23 kg; US customary
 * in/lb, LC 51 lb) — not as a conversion of one another — so worked examples in either can be
 * checked exactly. Multipliers are kept unrounded. A multiplier of 0 means the task is outside what
 * the equation can judge: the index is then null and the band `stop`.
 */
import { bandForIndex, NIOSH_THRESHOLDS } from "./bands";
import { durationBand, frequencyMultiplier, MAX_FREQUENCY, MIN_FREQUENCY } from "./niosh-frequency";
import { SOURCES } from "./sources";
import type { Band, Coupling, Reason, ResultBase, Units, Warning } from "./types";
import { RULES_VERSION } from "./version";

export interface HandPosition {
  /** Horizontal distance of the hands from the mid-point between the ankles. */
  h: number;
  /** Vertical height of the hands above the floor. */
  v: number;
  /** Asymmetry angle in degrees. */
  a: number;
}

export interface NioshRequest {
  method: "niosh";
  units: Units;
  load: number;
  origin: HandPosition;
  destination: HandPosition;
  /** Lifts per minute. */
  frequency: number;
  durationHours: number;
  coupling: Coupling;
  controlAtDestination: boolean;
}

export interface NioshEndResult {
  hm: number;
  vm: number;
  dm: number;
  am: number;
  fm: number;
  cm: number;
  rwl: number;
  li: number | null;
}

export interface NioshResult extends ResultBase {
  method: "niosh";
  inputs: NioshRequest & { travelDistance: number; durationBand: string; frequencyUsed: number };
  origin: NioshEndResult;
  destination: NioshEndResult | null;
  /** The governing (larger) lifting index; null when the equation cannot judge the task. */
  li: number | null;
  /** Same as `li`: every method exposes `index` and `limit`. */
  index: number | null;
  /** The governing RWL. */
  limit: number;
}

/** The constants of one published unit system. */
export interface UnitSystem {
  name: Units;
  lengthUnit: string;
  massUnit: string;
  loadConstant: number;
  hMin: number;
  hMax: number;
  hNumerator: number;
  vOptimum: number;
  vMax: number;
  vSlope: number;
  dMin: number;
  dMax: number;
  dNumerator: number;
  /** Vertical height dividing the FM and CM columns (75 cm / 30 in). */
  vColumnSplit: number;
}

export const METRIC: UnitSystem = {
  name: "metric",
  lengthUnit: "cm",
  massUnit: "kg",
  loadConstant: 23,
  hMin: 25,
  hMax: 63,
  hNumerator: 25,
  vOptimum: 75,
  vMax: 175,
  vSlope: 0.003,
  dMin: 25,
  dMax: 175,
  dNumerator: 4.5,
  vColumnSplit: 75,
};

export const US_CUSTOMARY: UnitSystem = {
  name: "us",
  lengthUnit: "in",
  massUnit: "lb",
  loadConstant: 51,
  hMin: 10,
  hMax: 25,
  hNumerator: 10,
  vOptimum: 30,
  vMax: 70,
  vSlope: 0.0075,
  dMin: 10,
  dMax: 70,
  dNumerator: 1.8,
  vColumnSplit: 30,
};

export const MAX_ASYMMETRY_DEG = 135;

export function unitSystem(units: Units): UnitSystem {
  return units === "us" ? US_CUSTOMARY : METRIC;
}

export function horizontalMultiplier(h: number, u: UnitSystem): number {
  if (h > u.hMax) return 0;
  if (h <= u.hMin) return 1;
  return u.hNumerator / h;
}

export function verticalMultiplier(v: number, u: UnitSystem): number {
  if (v > u.vMax) return 0;
  return Math.max(0, 1 - u.vSlope * Math.abs(v - u.vOptimum));
}

export function distanceMultiplier(d: number, u: UnitSystem): number {
  if (d > u.dMax) return 0;
  if (d <= u.dMin) return 1;
  return 0.82 + u.dNumerator / d;
}

export function asymmetricMultiplier(aDeg: number): number {
  if (aDeg > MAX_ASYMMETRY_DEG) return 0;
  return 1 - 0.0032 * aDeg;
}

/** Coupling multiplier (manual Table 7; values recalled from memory, see REFERENCES.md §1). */
export function couplingMultiplier(coupling: Coupling, v: number, u: UnitSystem): number {
  if (coupling === "good") return 1;
  if (coupling === "poor") return 0.9;
  return v < u.vColumnSplit ? 0.95 : 1;
}

/** Multipliers other than FM at one end of the lift; shared with the composite index. */
export function endMultipliers(
  pos: HandPosition,
  travel: number,
  coupling: Coupling,
  u: UnitSystem,
): Omit<NioshEndResult, "fm" | "rwl" | "li"> {
  return {
    hm: horizontalMultiplier(pos.h, u),
    vm: verticalMultiplier(pos.v, u),
    dm: distanceMultiplier(travel, u),
    am: asymmetricMultiplier(pos.a),
    cm: couplingMultiplier(coupling, pos.v, u),
  };
}

function scoreEnd(
  req: NioshRequest,
  pos: HandPosition,
  travel: number,
  u: UnitSystem,
): NioshEndResult {
  const m = endMultipliers(pos, travel, req.coupling, u);
  const fm = frequencyMultiplier(
    req.frequency,
    durationBand(req.durationHours),
    pos.v >= u.vColumnSplit,
  );
  const rwl = u.loadConstant * m.hm * m.vm * m.dm * m.am * fm * m.cm;
  return { ...m, fm, rwl, li: rwl > 0 ? req.load / rwl : null };
}

/** Warnings for every input outside the equation's range, naming the variable. */
export function rangeWarnings(
  req: Pick<NioshRequest, "origin" | "destination" | "frequency" | "durationHours">,
  u: UnitSystem,
  path = "",
): Warning[] {
  const warnings: Warning[] = [];
  const L = u.lengthUnit;
  for (const end of ["origin", "destination"] as const) {
    const pos = req[end];
    if (pos.h > u.hMax)
      warnings.push({
        field: `${path}${end}.h`,
        message: `H at the ${end} is ${pos.h} ${L}, beyond the equation's ${u.hMax} ${L}: HM is 0 and the equation cannot judge this lift. Bring the load closer.`,
      });
    if (pos.v > u.vMax)
      warnings.push({
        field: `${path}${end}.v`,
        message: `V at the ${end} is ${pos.v} ${L}, above the equation's ${u.vMax} ${L}: VM is 0 and the equation cannot judge this lift.`,
      });
    if (pos.a > MAX_ASYMMETRY_DEG)
      warnings.push({
        field: `${path}${end}.a`,
        message: `Asymmetry at the ${end} is ${pos.a}°, beyond ${MAX_ASYMMETRY_DEG}°: AM is 0 and the equation cannot judge this lift.`,
      });
  }
  const travel = Math.abs(req.destination.v - req.origin.v);
  if (travel > u.dMax)
    warnings.push({
      field: `${path}destination.v`,
      message: `Vertical travel D is ${round(travel)} ${L}, beyond the equation's ${u.dMax} ${L}: DM is 0 and the equation cannot judge this lift.`,
    });
  if (req.frequency < MIN_FREQUENCY)
    warnings.push({
      field: `${path}frequency`,
      message: `Frequency ${req.frequency}/min is below ${MIN_FREQUENCY}/min: taken as ${MIN_FREQUENCY}/min, as the manual directs.`,
    });
  if (req.frequency > MAX_FREQUENCY)
    warnings.push({
      field: `${path}frequency`,
      message: `Frequency ${req.frequency}/min is above ${MAX_FREQUENCY}/min: FM is 0 and the equation cannot judge this job.`,
    });
  if (req.durationHours > 8)
    warnings.push({
      field: `${path}durationHours`,
      message: `Duration ${req.durationHours} h is beyond the equation's 8 h: the 2–8 h column is used, which may understate the risk.`,
    });
  return warnings;
}

export function scoreNiosh(req: NioshRequest): NioshResult {
  const u = unitSystem(req.units);
  const travel = Math.abs(req.destination.v - req.origin.v);
  const origin = scoreEnd(req, req.origin, travel, u);
  const destination = req.controlAtDestination
    ? scoreEnd(req, req.destination, travel, u)
    : null;
  const warnings = rangeWarnings(req, u);

  const ends = destination ? [origin, destination] : [origin];
  const outOfRange = ends.some((e) => e.li === null);
  const governing = outOfRange
    ? ends.find((e) => e.li === null)!
    : ends.reduce((a, b) => ((b.li ?? 0) > (a.li ?? 0) ? b : a));
  const li = outOfRange ? null : governing.li;
  const band = bandForIndex(li, NIOSH_THRESHOLDS);

  return {
    method: "niosh",
    inputs: {
      ...req,
      travelDistance: travel,
      durationBand: durationBand(req.durationHours),
      frequencyUsed: Math.max(req.frequency, MIN_FREQUENCY),
    },
    origin,
    destination,
    li,
    index: li,
    limit: governing.rwl,
    band,
    reasons: nioshReasons(li, band, governing, destination !== null && governing === destination, u, req.load),
    warnings,
    rulesVersion: RULES_VERSION,
  };
}

function nioshReasons(
  li: number | null,
  band: Band,
  governing: NioshEndResult,
  atDestination: boolean,
  u: UnitSystem,
  load: number,
): Reason[] {
  const where = atDestination ? "destination" : "origin";
  if (li === null) {
    return [
      {
        text: "At least one multiplier is 0: the lift is outside the range the NIOSH equation can judge, so no lifting index is given. Do not proceed as planned.",
        source: SOURCES.nioshManual,
      },
    ];
  }
  const reasons: Reason[] = [
    {
      text: `Recommended weight limit at the ${where} is ${round(governing.rwl)} ${u.massUnit}; the load of ${load} ${u.massUnit} gives a lifting index of ${round(li)}.`,
      source: SOURCES.nioshManual,
    },
  ];
  if (band === "clear")
    reasons.push({ text: "Lifting index at or below 1.0: nominal risk for nearly all healthy workers.", source: SOURCES.nioshManual });
  else if (band === "stop")
    reasons.push({ text: "Lifting index above 3.0: nearly all workers are at increased risk of injury.", source: SOURCES.nioshManual });
  else
    reasons.push({
      text: `Lifting index above 1.0: increased risk for some workers. Heftwise puts LI up to ${NIOSH_THRESHOLDS.watchUpTo} at watch and up to 3.0 at act.`,
      source: `${SOURCES.nioshManual}; thresholds between 1 and 3: ${SOURCES.heftwisePolicy}`,
    });
  const weakest = weakestMultiplier(governing);
  if (weakest && band !== "clear")
    reasons.push({
      text: `The largest reduction comes from ${weakest.name} (${round(weakest.value)}): ${weakest.advice}`,
      source: SOURCES.nioshManual,
    });
  return reasons;
}

const ADVICE: Record<string, [string, string]> = {
  hm: ["the horizontal distance (HM)", "bring the load closer to the body."],
  vm: ["the hand height (VM)", "raise or lower the start or end height towards knuckle height."],
  dm: ["the vertical travel (DM)", "reduce the height the load travels."],
  am: ["twisting (AM)", "turn the feet, not the trunk; re-arrange the workplace."],
  fm: ["the frequency (FM)", "lift less often, or share the work and take breaks."],
  cm: ["the grip (CM)", "use handles, a lifting aid or a better container."],
};

function weakestMultiplier(end: NioshEndResult) {
  let best: { name: string; value: number; advice: string } | null = null;
  for (const key of Object.keys(ADVICE) as (keyof typeof ADVICE)[]) {
    const value = end[key as keyof NioshEndResult] as number;
    if (value < 1 && (!best || value < best.value)) best = { name: ADVICE[key][0], value, advice: ADVICE[key][1] };
  }
  return best;
}

export function round(x: number, dp = 2): number {
  const f = 10 ** dp;
  return Math.round(x * f) / f;
}
