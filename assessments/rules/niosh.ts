/**
 * Revised NIOSH Lifting Equation (Waters, Putz-Anderson, Garg; NIOSH Pub. 94-110).
 *
 *   RWL = LC × HM × VM × DM × AM × FM × CM,   LI = load ÷ RWL
 *
 * Both published unit systems are implemented as published (metric cm/kg, LC 23 kg; US customary
 * in/lb, LC 51 lb) — not as a conversion of one another — so worked examples in either can be
 * checked exactly. Multipliers are kept unrounded. A multiplier of 0 means the task is outside what
 * the equation can judge. Heftwise judges the lift as a whole: a hand position outside the range at
 * either end (with or without control at the destination), a travel beyond the range, or an FM of 0
 * leaves no index, and the band is `stop` with each cause named.
 */
import { bandForIndex, NIOSH_THRESHOLDS, worstBand } from "./bands";
import { applyConditions, type Condition } from "./conditions";
import {
  DURATION_LABELS,
  durationBand,
  frequencyMultiplier,
  MIN_FREQUENCY,
  nominalDurationBand,
  RECOVERY_RATIO,
  zeroFrequencyExplanation,
  type DurationBand,
} from "./niosh-frequency";
import { fmt } from "./format";
import { SOURCES } from "./sources";
import type { Band, Coupling, Reason, ResultBase, Units, Warning } from "./types";
import { RULES_VERSION } from "./version";

export interface HandPosition {
  /** Horizontal distance of the hands from the mid-point between the ankles. */
  h: number;
  /** Vertical height of the hands above the standing surface; negative below it (outside the equation). */
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
  /** Rest or light work that follows the lifting (hours): decides the duration category. */
  recoveryHours?: number;
  coupling: Coupling;
  controlAtDestination: boolean;
  /** Working conditions present: each lifts the band to at least Watch. */
  conditions?: Condition[];
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
  /** The request as validated. */
  inputs: NioshRequest;
  /** Values the method derives from the inputs before scoring. */
  derived: { travelDistance: number; durationBand: DurationBand; frequencyUsed: number };
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
  if (v > u.vMax || v < 0) return 0;
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

function scoreEnd(
  req: NioshRequest,
  pos: HandPosition,
  travel: number,
  duration: DurationBand,
  u: UnitSystem,
): NioshEndResult {
  // Plain literals, no spreads: this is the hot path of live scoring and batch scoring.
  const hm = horizontalMultiplier(pos.h, u);
  const vm = verticalMultiplier(pos.v, u);
  const dm = distanceMultiplier(travel, u);
  const am = asymmetricMultiplier(pos.a);
  const cm = couplingMultiplier(req.coupling, pos.v, u);
  const fm = frequencyMultiplier(req.frequency, duration, pos.v >= u.vColumnSplit);
  const rwl = u.loadConstant * hm * vm * dm * am * fm * cm;
  return { hm, vm, dm, am, fm, cm, rwl, li: rwl > 0 ? req.load / rwl : null };
}

/**
 * Warnings for every input outside the equation's range, naming the variable (prefixed by `path`).
 * Hand positions are checked at both ends whether or not the destination is scored: the hands are
 * there either way. Those that leave a multiplier at 0 carry `cannotJudge`.
 */
export function rangeWarnings(
  origin: HandPosition,
  destination: HandPosition,
  frequency: number,
  durationHours: number,
  recoveryHours: number | undefined,
  u: UnitSystem,
  path = "",
): Warning[] {
  const warnings: Warning[] = [];
  endWarnings(warnings, origin, "origin", u, path);
  endWarnings(warnings, destination, "destination", u, path);
  const L = u.lengthUnit;
  const travel = Math.abs(destination.v - origin.v);
  if (travel > u.dMax)
    warnings.push({
      field: `${path}destination.v`,
      message: `Vertical travel D is ${fmt(travel)} ${L}, beyond the equation's ${fmt(u.dMax)} ${L}: DM is 0 and the equation cannot judge this lift. Break the lift into stages of at most ${fmt(u.dMax)} ${L}.`,
      cannotJudge: true,
    });
  if (frequency < MIN_FREQUENCY)
    warnings.push({
      field: `${path}frequency`,
      message: `Frequency ${fmt(frequency)}/min is below ${fmt(MIN_FREQUENCY)}/min: taken as ${fmt(MIN_FREQUENCY)}/min, as the manual directs.`,
    });
  if (durationHours > 8)
    warnings.push({
      field: `${path}durationHours`,
      message: `Duration ${fmt(durationHours)} h is beyond the equation's 8 h: the 2–8 h column is used, which may understate the risk.`,
    });
  const nominal = nominalDurationBand(durationHours);
  const actual = durationBand(durationHours, recoveryHours);
  if (nominal !== actual) {
    const needed = RECOVERY_RATIO[nominal as "short" | "moderate"] * durationHours;
    warnings.push({
      field: `${path}recoveryHours`,
      message:
        recoveryHours === undefined
          ? `No recovery time given: ${fmt(durationHours)} h of lifting counts as ${DURATION_LABELS[nominal]} only when at least ${fmt(needed)} h of rest or light work follows it, so the ${DURATION_LABELS[actual]} column is used. Enter the recovery time if there is one.`
          : `Recovery of ${fmt(recoveryHours)} h is less than the ${fmt(needed)} h that ${fmt(durationHours)} h of lifting needs to count as ${DURATION_LABELS[nominal]}: the ${DURATION_LABELS[actual]} column is used.`,
    });
  }
  return warnings;
}

/** What to change, for each multiplier that can fall to 0 at an end. */
function endWarnings(warnings: Warning[], pos: HandPosition, end: string, u: UnitSystem, path: string): void {
  const L = u.lengthUnit;
  if (pos.h > u.hMax)
    warnings.push({
      field: `${path}${end}.h`,
      message: `H at the ${end} is ${fmt(pos.h)} ${L}, beyond the equation's ${fmt(u.hMax)} ${L}: HM is 0 and the equation cannot judge this lift. Bring the load within ${fmt(u.hMax)} ${L} of the ankles, or use a lifting aid.`,
      cannotJudge: true,
    });
  if (pos.v > u.vMax)
    warnings.push({
      field: `${path}${end}.v`,
      message: `V at the ${end} is ${fmt(pos.v)} ${L}, above the equation's ${fmt(u.vMax)} ${L}: VM is 0 and the equation cannot judge this lift. Lower that end, or raise the worker on a platform.`,
      cannotJudge: true,
    });
  else if (pos.v < 0)
    warnings.push({
      field: `${path}${end}.v`,
      message: `V at the ${end} is ${fmt(-pos.v)} ${L} below the standing surface: the equation's V runs from 0, so VM is 0 and it cannot judge this lift. Receive the load from a second person standing in the excavation, lower from kneeling onto a mat, use a tripod hoist or davit, or pass it down in smaller parts.`,
      cannotJudge: true,
    });
  if (pos.a > MAX_ASYMMETRY_DEG)
    warnings.push({
      field: `${path}${end}.a`,
      message: `Asymmetry at the ${end} is ${fmt(pos.a)}°, beyond ${MAX_ASYMMETRY_DEG}°: AM is 0 and the equation cannot judge this lift. Turn the feet, not the trunk, or re-arrange the workplace.`,
      cannotJudge: true,
    });
}

/** The V column of Table 5 in the request's units ("V < 75 cm"). */
export function vColumnLabel(highVertical: boolean, u: UnitSystem): string {
  return `V ${highVertical ? "≥" : "<"} ${fmt(u.vColumnSplit)} ${u.lengthUnit}`;
}

export function scoreNiosh(req: NioshRequest): NioshResult {
  const u = unitSystem(req.units);
  const travel = Math.abs(req.destination.v - req.origin.v);
  const duration = durationBand(req.durationHours, req.recoveryHours);
  const origin = scoreEnd(req, req.origin, travel, duration, u);
  const destination = req.controlAtDestination ? scoreEnd(req, req.destination, travel, duration, u) : null;
  const warnings = rangeWarnings(req.origin, req.destination, req.frequency, req.durationHours, req.recoveryHours, u);
  const zeroFm = origin.fm === 0 ? req.origin : destination && destination.fm === 0 ? req.destination : null;
  if (zeroFm) {
    const high = zeroFm.v >= u.vColumnSplit;
    warnings.push({
      field: "frequency",
      message: `FM is 0: ${zeroFrequencyExplanation(req.frequency, duration, high, vColumnLabel(high, u))} Lift less often, for a shorter time, or share the work.`,
      cannotJudge: true,
    });
  }

  // The equation judges the lift as a whole: any multiplier of 0 at either end leaves no index.
  let judgeable = true;
  for (const w of warnings) if (w.cannotJudge) judgeable = false;
  // Otherwise the larger index governs.
  const governing =
    destination && destination.li !== null && origin.li !== null && destination.li > origin.li ? destination : origin;
  const li = judgeable ? governing.li : null;
  const reasons = judgeable
    ? nioshReasons(li!, bandForIndex(li, NIOSH_THRESHOLDS), governing, governing === destination, u, req.load)
    : outOfRangeReasons(warnings);
  const floors: Band[] = [bandForIndex(li, NIOSH_THRESHOLDS)];
  applyConditions(req.conditions, floors, reasons);
  const band = worstBand(floors);

  return {
    method: "niosh",
    inputs: req,
    derived: { travelDistance: travel, durationBand: duration, frequencyUsed: Math.max(req.frequency, MIN_FREQUENCY) },
    origin,
    destination,
    li,
    index: li,
    limit: judgeable ? governing.rwl : 0,
    band,
    reasons,
    warnings,
    rulesVersion: RULES_VERSION,
  };
}

// Reasons that never change are made once (and frozen, since results share them).
const OUT_OF_RANGE_REASON: Reason = Object.freeze({
  text: "At least one multiplier is 0: the lift is outside the range the NIOSH equation can judge, so no lifting index is given and it is never Clear. Do not proceed as planned.",
  source: SOURCES.nioshManual,
});
const BAND_REASON: Record<Band, Reason> = {
  clear: Object.freeze({
    text: "Lifting index at or below 1.0: nominal risk for nearly all healthy workers.",
    source: SOURCES.nioshManual,
  }),
  watch: Object.freeze({
    text: `Lifting index above 1.0: increased risk for some workers. Heftwise puts LI up to ${NIOSH_THRESHOLDS.watchUpTo} at watch and up to 3.0 at act.`,
    source: `${SOURCES.nioshManual}; thresholds between 1 and 3: ${SOURCES.heftwisePolicy}`,
  }),
  act: Object.freeze({
    text: `Lifting index above ${NIOSH_THRESHOLDS.watchUpTo}: increased risk for many workers; redesign the lift before work. Heftwise puts LI up to 3.0 at act.`,
    source: `${SOURCES.nioshManual}; thresholds between 1 and 3: ${SOURCES.heftwisePolicy}`,
  }),
  stop: Object.freeze({
    text: "Lifting index above 3.0: nearly all workers are at increased risk of injury.",
    source: SOURCES.nioshManual,
  }),
};

/** Each cause named, after the general statement. */
function outOfRangeReasons(warnings: Warning[]): Reason[] {
  const reasons: Reason[] = [OUT_OF_RANGE_REASON];
  for (const w of warnings)
    if (w.cannotJudge)
      reasons.push({
        text: w.message,
        source: w.field.endsWith("frequency") ? SOURCES.nioshFrequencyTable : SOURCES.nioshManual,
      });
  return reasons;
}

function nioshReasons(
  li: number,
  band: Band,
  governing: NioshEndResult,
  atDestination: boolean,
  u: UnitSystem,
  load: number,
): Reason[] {
  const reasons: Reason[] = [
    {
      text: `Recommended weight limit at the ${atDestination ? "destination" : "origin"} is ${fmt(governing.rwl)} ${u.massUnit}; the load of ${fmt(load)} ${u.massUnit} gives a lifting index of ${fmt(li)}.`,
      source: SOURCES.nioshManual,
    },
    BAND_REASON[band],
  ];
  if (band !== "clear") {
    const weakest = weakestMultiplier(governing);
    if (weakest >= 0) {
      const item = ADVICE[weakest];
      reasons.push({
        text: `The largest reduction comes from ${item.name} (${fmt(governing[item.key])}): ${item.advice}`,
        source: SOURCES.nioshManual,
      });
    }
  }
  return reasons;
}

const ADVICE: readonly { key: "hm" | "vm" | "dm" | "am" | "fm" | "cm"; name: string; advice: string }[] = [
  { key: "hm", name: "the horizontal distance (HM)", advice: "bring the load closer to the body." },
  { key: "vm", name: "the hand height (VM)", advice: "raise or lower the start or end height towards knuckle height." },
  { key: "dm", name: "the vertical travel (DM)", advice: "reduce the height the load travels." },
  { key: "am", name: "twisting (AM)", advice: "turn the feet, not the trunk; re-arrange the workplace." },
  { key: "fm", name: "the frequency (FM)", advice: "lift less often, or share the work and take breaks." },
  { key: "cm", name: "the grip (CM)", advice: "use handles, a lifting aid or a better container." },
];

/** Index in ADVICE of the multiplier that cuts the limit most, or -1 when none is below 1. */
function weakestMultiplier(end: NioshEndResult): number {
  // Written out rather than looped over keys: this runs on every scoring above clear.
  const values = [end.hm, end.vm, end.dm, end.am, end.fm, end.cm];
  let best = -1;
  let lowest = 1;
  for (let i = 0; i < 6; i++) {
    if (values[i] < lowest) {
      lowest = values[i];
      best = i;
    }
  }
  return best;
}
