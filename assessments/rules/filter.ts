/**
 * Guideline-weight filter of the HSE guidance on the Manual Handling Operations Regulations 1992
 * (L23; INDG143), with team handling and carrying.
 *
 * The figures are a filter, not limits: above them a fuller assessment is needed. Men's figures are
 * read in a reproduction of the published table; women's are recalled from memory (REFERENCES.md §2).
 */
import { bandForIndex, GUIDELINE_THRESHOLDS, worstBand } from "./bands";
import { applyConditions, type Condition } from "./conditions";
import { fmt } from "./format";
import { SOURCES } from "./sources";
import { MAX_TEAM_SIZE, teamCapacity, teamFactor } from "./team";
import type { Band, Reason, ResultBase, Sex, Warning } from "./types";
import { RULES_VERSION } from "./version";

export const ZONES = [
  "below-standing-level",
  "floor-to-lower-leg",
  "lower-leg-to-knuckle",
  "knuckle-to-elbow",
  "elbow-to-shoulder",
  "shoulder-to-reach",
] as const;
export type Zone = (typeof ZONES)[number];
export type Reach = "close" | "extended";

export const ZONE_LABELS: Record<Zone, string> = {
  "below-standing-level": "below the standing surface (into an excavation, chamber or trough)",
  "floor-to-lower-leg": "floor to mid lower leg",
  "lower-leg-to-knuckle": "mid lower leg to knuckle",
  "knuckle-to-elbow": "knuckle to elbow",
  "elbow-to-shoulder": "elbow to shoulder",
  "shoulder-to-reach": "shoulder to full reach",
};

/** The zones the published table covers. */
export type TableZone = Exclude<Zone, "below-standing-level">;
export const TABLE_ZONES = ZONES.filter((z): z is TableZone => z !== "below-standing-level");

/** Guideline weights in kg: [close, extended]. */
const GUIDELINE_KG: Record<Sex, Record<TableZone, readonly [number, number]>> = {
  male: {
    "shoulder-to-reach": [10, 5],
    "elbow-to-shoulder": [20, 10],
    "knuckle-to-elbow": [25, 15],
    "lower-leg-to-knuckle": [20, 10],
    "floor-to-lower-leg": [10, 5],
  },
  female: {
    "shoulder-to-reach": [7, 3],
    "elbow-to-shoulder": [13, 7],
    "knuckle-to-elbow": [16, 10],
    "lower-leg-to-knuckle": [13, 7],
    "floor-to-lower-leg": [7, 3],
  },
};

/**
 * The table figure for a zone. Nothing is published below the lowest zone ("floor to mid lower
 * leg"), so hands below the standing surface are compared with that zone's figure (Heftwise policy):
 * it can only overstate what may be handled there, and the band is never better than act.
 */
export function guidelineWeight(sex: Sex, zone: Zone, reach: Reach): number {
  return GUIDELINE_KG[sex][zone === "below-standing-level" ? "floor-to-lower-leg" : zone][reach === "close" ? 0 : 1];
}

/** Heftwise policy: the band of a handling below the standing surface is at least this. */
export const BELOW_STANDING_LEVEL_FLOOR: Band = "act";

/**
 * Frequency reduction as a fraction. Published: none up to about 30 operations an hour
 * (0.5/min); 30 % at once or twice a minute; 50 % at 5–8 a minute; 80 % above about 12 a minute.
 * Heftwise policy for the gaps, conservative: above 0.5 up to 2/min takes 30 %; above 2 up to
 * 8/min (3–4/min is not published) takes 50 %; above 8/min (9–12/min is not published) takes 80 %.
 */
export function frequencyReduction(perMinute: number): number {
  if (perMinute <= 0.5) return 0;
  if (perMinute <= 2) return 0.3;
  if (perMinute <= 8) return 0.5;
  return 0.8;
}

/** Published: twisting beyond 45° reduce 10 %, beyond 90° reduce 20 %. */
export function twistReduction(twistDeg: number): number {
  if (twistDeg > 90) return 0.2;
  if (twistDeg > 45) return 0.1;
  return 0;
}

/**
 * Heftwise policy: reductions add (30 % and 10 % make 40 %), which is more conservative than
 * multiplying them; the guidance does not say how they combine. Never below 0.
 */
export function combinedReductionFactor(perMinute: number, twistDeg: number): number {
  return Math.max(0, 1 - frequencyReduction(perMinute) - twistReduction(twistDeg));
}

/** Carrying held against the body: the filter holds up to about 10 m without rest. */
export const CARRY_FILTER_LIMIT_M = 10;
/** ISO 11228-1 cumulative mass per 8 h shift (from memory): ideal conditions, and long carries (≥ 20 m). */
export const CUMULATIVE_MASS_PER_SHIFT_KG = 10_000;
export const CUMULATIVE_MASS_LONG_CARRY_KG = 6_000;
export const LONG_CARRY_M = 20;
export const SHIFT_HOURS = 8;

export interface FilterRequest {
  method: "filter";
  sex: Sex;
  zone: Zone;
  reach: Reach;
  load: number;
  /** Operations per minute. */
  frequency: number;
  twistDeg: number;
  teamSize: number;
  /** Distance carried, when the load is carried (m). */
  carryDistanceM?: number;
  /** Hours spent on this task in the shift, for the cumulative mass of a carry (default: a full 8 h shift). */
  durationHours?: number;
  /** Working conditions present: each lifts the band to at least Watch. */
  conditions?: Condition[];
}

export interface FilterResult extends ResultBase {
  method: "filter";
  inputs: FilterRequest;
  /** The table figure for one person, before reductions (kg). */
  baseGuideline: number;
  frequencyReduction: number;
  twistReduction: number;
  /** Fraction kept after reductions. */
  reductionFactor: number;
  teamFactor: number;
  /** Guideline for the whole team after all reductions (kg). */
  guideline: number;
  limit: number;
  /** Load ÷ guideline; null when no guideline weight remains. */
  index: number | null;
  /** Each team member's share of the load (kg). */
  perPersonLoad: number;
  /** Mass each person moves in the hours carried (kg), when carried; else null. */
  cumulativeMassKg: number | null;
}

export function scoreFilter(req: FilterRequest): FilterResult {
  const base = guidelineWeight(req.sex, req.zone, req.reach);
  const fr = frequencyReduction(req.frequency);
  const tr = twistReduction(req.twistDeg);
  const factor = combinedReductionFactor(req.frequency, req.twistDeg);
  const team = teamFactor(req.teamSize);
  const guideline = teamCapacity(base * factor, req.teamSize);
  const index = guideline > 0 ? req.load / guideline : null;

  const reasons: Reason[] = [];
  const warnings: Warning[] = [];
  const floors: Band[] = [bandForIndex(index, GUIDELINE_THRESHOLDS)];
  const who = req.sex === "male" ? "men" : "women";

  if (req.zone === "below-standing-level") {
    floors.push(BELOW_STANDING_LEVEL_FLOOR);
    warnings.push({
      field: "zone",
      message:
        "Hands below the standing surface: the guideline figures end at the lowest zone (floor to mid lower leg), so they cannot judge this. Receive the load from a second person standing in the excavation, lower from kneeling onto a mat, use a tripod hoist or davit, or pass it down in smaller parts.",
      cannotJudge: true,
    });
    reasons.push({
      text: `Below the standing surface nothing is published: compared with the lowest zone's figure for ${who} (${fmt(base)} kg), which overstates what can be handled there; never better than Act.`,
      source: `${SOURCES.hseL23} (lowest zone); below it: ${SOURCES.heftwisePolicy}`,
    });
  } else
    reasons.push({
      text: `Guideline weight for ${who}, hands ${ZONE_LABELS[req.zone]}, load ${req.reach === "close" ? "close to the body" : "at arm's length"}: ${fmt(base)} kg.`,
      source: req.sex === "male" ? SOURCES.hseL23 : `${SOURCES.hseL23} (women's figures from memory)`,
    });
  if (fr > 0)
    reasons.push({
      text: `${fmt(req.frequency)} operations a minute: reduced by ${fr * 100} %.`,
      source:
        req.frequency <= 2 || req.frequency > 12 || (req.frequency >= 5 && req.frequency <= 8)
          ? SOURCES.hseL23
          : `${SOURCES.heftwisePolicy} (the guidance gives no figure for this frequency; the next published reduction is used)`,
    });
  if (tr > 0)
    reasons.push({
      text: `Twisting ${fmt(req.twistDeg)}°: reduced by ${tr * 100} %.`,
      source: SOURCES.hseL23,
    });
  if (fr > 0 && tr > 0)
    reasons.push({
      text: `Reductions added together: ${fmt((fr + tr) * 100, 0)} % in all.`,
      source: SOURCES.heftwisePolicy,
    });
  if (req.teamSize > 1)
    reasons.push({
      text: `Team of ${fmt(req.teamSize)}: the team handles about ${req.teamSize === 2 ? "two-thirds" : "half"} of the sum of its members' capabilities; each carries about ${fmt(req.load / req.teamSize)} kg.`,
      source:
        req.teamSize <= 3 ? SOURCES.hseL23 : `${SOURCES.hseL23}; team of four at one half: ${SOURCES.heftwisePolicy}`,
    });
  if (req.teamSize > MAX_TEAM_SIZE) {
    floors.push("stop");
    reasons.push({
      text: `A team of ${fmt(req.teamSize)} is more than four: such teams are unlikely to work well together. Use a mechanical aid.`,
      source: SOURCES.hseL23,
    });
  }
  if (index === null) {
    reasons.push({
      text: "After the reductions no guideline weight remains: the task must be redesigned.",
      source: SOURCES.heftwisePolicy,
    });
    warnings.push({
      field: "frequency",
      message:
        "The frequency and twisting reductions together leave no guideline weight: the filter cannot judge this. Handle less often or remove the twist.",
      cannotJudge: true,
    });
  } else
    reasons.push({
      text: `Load ${fmt(req.load)} kg against a guideline of ${fmt(guideline)} kg: index ${fmt(index)}${index > 1 ? " — above the filter, a fuller assessment is needed" : ", within the filter"}.`,
      source: index > 1 ? `${SOURCES.hseL23}; bands above 1: ${SOURCES.heftwisePolicy}` : SOURCES.hseL23,
    });

  let cumulativeMassKg: number | null = null;
  const carry = req.carryDistanceM;
  if (carry !== undefined && carry > 0) {
    if (carry > CARRY_FILTER_LIMIT_M) {
      floors.push("watch");
      warnings.push({
        field: "carryDistanceM",
        message: `Carried ${fmt(carry)} m: the guideline figures hold up to about ${CARRY_FILTER_LIMIT_M} m without rest. Assess the carry in more detail, or plan rests or a trolley.`,
      });
    }
    if (
      req.zone === "floor-to-lower-leg" ||
      req.zone === "lower-leg-to-knuckle" ||
      req.zone === "below-standing-level"
    ) {
      floors.push("watch");
      warnings.push({
        field: "zone",
        message:
          "Carried with the hands below knuckle height: the guideline figures do not cover this. Assess in more detail.",
      });
    }
    // Counted per person: each member of a team carries their share (ISO 11228-1 practice).
    const hours = req.durationHours ?? SHIFT_HOURS;
    cumulativeMassKg = (req.load / req.teamSize) * Math.max(req.frequency, 0) * 60 * hours;
    const allowance = carry >= LONG_CARRY_M ? CUMULATIVE_MASS_LONG_CARRY_KG : CUMULATIVE_MASS_PER_SHIFT_KG;
    reasons.push({
      text: `Mass carried in ${fmt(hours)} h${req.teamSize > 1 ? " by each person" : ""}: ${fmt(cumulativeMassKg, 0)} kg against ${fmt(allowance)} kg per 8 h shift${carry >= LONG_CARRY_M ? " for carries of 20 m or more" : " under ideal conditions"}.`,
      source: SOURCES.iso11228,
    });
    if (cumulativeMassKg > allowance) {
      floors.push("act");
      warnings.push({
        field: "frequency",
        message: `Cumulative mass carried${req.teamSize > 1 ? " by each person" : ""} (${fmt(cumulativeMassKg, 0)} kg) exceeds ${fmt(allowance)} kg per shift: reduce the number of carries, share the work or use a trolley.`,
      });
    }
  }

  applyConditions(req.conditions, floors, reasons);

  return {
    method: "filter",
    inputs: req,
    baseGuideline: base,
    frequencyReduction: fr,
    twistReduction: tr,
    reductionFactor: factor,
    teamFactor: team,
    guideline,
    limit: guideline,
    index,
    perPersonLoad: req.load / req.teamSize,
    cumulativeMassKg,
    band: worstBand(floors),
    reasons,
    warnings,
    rulesVersion: RULES_VERSION,
  };
}
