/**
 * Pushing, pulling, holding back and stopping a wheeled load — a track trolley on rails, a barrow
 * or a wheeled case — with the hands between knuckle and shoulder height.
 *
 * Forces along a gradient θ = atan(rise ÷ run), for a rolling coefficient C [pub, elementary
 * mechanics; REFERENCES.md §5, §7]:
 *   to keep moving uphill    F = m·g·(sin θ + C·cos θ)
 *   to hold it on the slope  F = m·g·(sin θ − C·cos θ)   (0 when it does not roll by itself)
 *   to stop it               F = hold + m·a
 * The conservative coefficient differs by question: the **highest** plausible value for the effort
 * of pushing, the **lowest** for whether the load runs away and for the force to hold it back.
 * A load runs away when tan θ > C_low. A force measured with a push-pull gauge overrides the
 * estimate of the effort (it cannot tell whether the load would run away, so it does not touch that).
 *
 * Heftwise policy, each conservative and named in the result:
 * - breakaway (starting) resistance is twice the rolling resistance;
 * - downhill, the slope's help with the effort is not counted: starting and keeping moving are taken
 *   as on the level (the route's gradient varies and the load may have to come back);
 * - stopping is from walking pace, 1.0 m/s (the top of ISO 11228-1's walking range, from memory),
 *   within 1.0 m: a = 0.5 m/s², on top of the force to hold it — the slope's help is not counted;
 * - holding and stopping are compared with the starting/stopping guideline force;
 * - a load that can run away is at least Watch; on rails (or where the surface is not stated),
 *   unbraked, it is Stop; braked, the plan names who works the brake;
 * - a trolley's use on the line follows the infrastructure manager's rules, which this does not replace.
 */
import { bandForIndex, GUIDELINE_THRESHOLDS, worstBand } from "./bands";
import { applyConditions, type Condition } from "./conditions";
import { fmt } from "./format";
import { SOURCES } from "./sources";
import { MAX_TEAM_SIZE, teamCapacity } from "./team";
import type { Band, Reason, ResultBase, Sex, Warning } from "./types";
import { RULES_VERSION } from "./version";

export const GRAVITY = 9.80665;
/** HSE L23: a well-maintained aid on level ground needs at least 2 % of the load. */
export const DEFAULT_ROLLING_COEFFICIENT = 0.02;
export const START_RESISTANCE_RATIO = 2;
/** More than about 20 m without a break needs a detailed assessment (L23). */
export const PUSH_DISTANCE_LIMIT_M = 20;
/** Heftwise policy: stopped from 1.0 m/s within 1.0 m. */
export const STOP_FROM_MS = 1.0;
export const STOP_WITHIN_M = 1.0;
export const STOP_DECELERATION = (STOP_FROM_MS * STOP_FROM_MS) / (2 * STOP_WITHIN_M);

export const SURFACES = ["rail", "hard", "rough"] as const;
export type Surface = (typeof SURFACES)[number];
export const SURFACE_LABELS: Record<Surface, string> = {
  rail: "on rails",
  hard: "on hard, even ground",
  rough: "on rough ground (ballast, cess, grass)",
};

/**
 * Rolling coefficients by surface: [effort (highest plausible), runaway (lowest plausible)].
 * - rail: effort 2 % (HSE's figure; no published coefficient for small track trolleys, REFERENCES.md
 *   §5); runaway 0.001 (steel wheel on steel rail 0.001–0.002, from memory, §7);
 * - hard: effort 2 % (HSE L23); runaway 0.005 (small hard wheels on smooth ground, from memory);
 * - rough: effort 10 % (small wheels on loose ground 5–10 %, from memory); runaway 0.02 (HSE's 2 %).
 * Where the surface is not stated, the rail figures are used: the load may be a trolley on rails.
 */
export const ROLLING: Record<Surface, { effort: number; runaway: number; source: string }> = {
  rail: {
    effort: 0.02,
    runaway: 0.001,
    source: `effort: ${SOURCES.hseL23} (2 %; no published figure for track trolleys); runaway: steel on rail, from memory`,
  },
  hard: {
    effort: 0.02,
    runaway: 0.005,
    source: `effort: ${SOURCES.hseL23} (2 %); runaway: small hard wheels, from memory`,
  },
  rough: {
    effort: 0.1,
    runaway: 0.02,
    source: `effort: small wheels on loose ground 5–10 %, from memory; runaway: ${SOURCES.hseL23} (2 %)`,
  },
};

/** Guideline forces in newtons (L23: men 20 kg ≈ 200 N to start or stop, 10 kg ≈ 100 N to keep moving; women 15 / 7 kg). */
export const GUIDELINE_FORCE_N: Record<Sex, { start: number; sustained: number }> = {
  male: { start: 200, sustained: 100 },
  female: { start: 150, sustained: 70 },
};

export interface PushRequest {
  method: "push";
  /** Mass of the loaded trolley or barrow (kg). */
  mass: number;
  /** Rise ÷ run along the direction of travel: 1 in 12 is 0.0833; negative is downhill. */
  gradient: number;
  /** An entered coefficient for the effort (record how it was obtained). */
  rollingCoefficient?: number;
  sex: Sex;
  teamSize: number;
  distanceM?: number;
  /** Force measured with a push-pull gauge (N): overrides the estimate for starting and keeping moving. */
  measuredForceN?: number;
  surface?: Surface;
  braked?: boolean;
  /** Who works the brake, when the load is braked. */
  brakeOperator?: string;
  /** Working conditions present: each lifts the band to at least Watch. */
  conditions?: Condition[];
}

export interface PushResult extends ResultBase {
  method: "push";
  inputs: PushRequest & { rollingCoefficient: number; slopeAngleDeg: number };
  /** Effort to keep it moving and to start it (N). */
  sustainedForceN: number;
  startForceN: number;
  /** Force to hold it still on the slope, and to stop it from walking pace (N). */
  holdForceN: number;
  stopForceN: number;
  /** It rolls by itself when let go (tan θ above the lowest plausible rolling coefficient). */
  runsAway: boolean;
  effortCoefficient: number;
  runawayCoefficient: number;
  /** The team's guideline forces (N). */
  guidelineSustainedN: number;
  guidelineStartN: number;
  perPersonSustainedN: number;
  perPersonStartN: number;
  forceSource: "estimated" | "measured";
  limit: number;
  index: number;
}

/** m·g·(sin θ + c·cos θ) along a gradient (rise ÷ run); c may be negative to hold back. */
export function slopeForce(mass: number, gradient: number, resistance: number): number {
  const theta = Math.atan(gradient);
  return mass * GRAVITY * (Math.sin(theta) + resistance * Math.cos(theta));
}

/** "1 in 60" for a gradient; "level" for 0. */
export function gradientText(gradient: number): string {
  if (gradient === 0) return "level";
  return `1 in ${fmt(1 / Math.abs(gradient), 0)} ${gradient > 0 ? "uphill" : "downhill"} (${fmt(Math.abs(gradient) * 100, 1)} %)`;
}

export function scorePush(req: PushRequest): PushResult {
  const surface = req.surface ?? "rail";
  const rolling = ROLLING[surface];
  const measured = req.measuredForceN !== undefined;
  const crr = req.rollingCoefficient ?? rolling.effort;
  const low = Math.min(crr, rolling.runaway);
  const slope = Math.abs(req.gradient);
  // Effort: uphill against the slope; downhill as on the level (policy).
  const effortGradient = Math.max(req.gradient, 0);
  const sustained = measured ? req.measuredForceN! : slopeForce(req.mass, effortGradient, crr);
  const start = measured ? req.measuredForceN! : slopeForce(req.mass, effortGradient, crr * START_RESISTANCE_RATIO);
  const runsAway = slope > low;
  const hold = runsAway ? slopeForce(req.mass, slope, -low) : 0;
  const stop = hold + req.mass * STOP_DECELERATION;
  const braked = req.braked === true;

  const individual = GUIDELINE_FORCE_N[req.sex];
  const guidelineStart = teamCapacity(individual.start, req.teamSize);
  const guidelineSustained = teamCapacity(individual.sustained, req.teamSize);
  const effortIndex = Math.max(start / guidelineStart, sustained / guidelineSustained);
  // With a brake the brake holds and stops the load; without, people do.
  const index = braked ? effortIndex : Math.max(effortIndex, hold / guidelineStart, stop / guidelineStart);

  const reasons: Reason[] = [];
  const warnings: Warning[] = [];
  const floors: Band[] = [bandForIndex(index, GUIDELINE_THRESHOLDS)];
  const who = req.sex === "male" ? "men" : "women";
  const team = req.teamSize > 1 ? `, team of ${fmt(req.teamSize)}` : "";

  reasons.push(
    measured
      ? {
          text: `Measured force ${fmt(sustained)} N used for starting and for keeping it moving.`,
          source: "Push-pull gauge reading entered by the assessor",
        }
      : {
          text: `${fmt(req.mass)} kg ${SURFACE_LABELS[surface]}, ${gradientText(req.gradient)}, rolling resistance ${fmt(crr * 100, 1)} % of the weight: ${fmt(start)} N to start it, ${fmt(sustained)} N to keep it moving${req.gradient < 0 ? " (downhill taken as level: the slope's help is not counted)" : ""}.`,
          source: `${req.rollingCoefficient !== undefined ? "Coefficient entered by the assessor" : rolling.source}; starting force and downhill effort: ${SOURCES.heftwisePolicy}`,
        },
    {
      text: braked
        ? `Braked: the brake holds and stops the load. Guideline forces for ${who}${team}: ${fmt(guidelineStart)} N to start, ${fmt(guidelineSustained)} N to keep moving; index ${fmt(index)}.`
        : `To hold it on the slope ${fmt(hold)} N, to stop it from ${fmt(STOP_FROM_MS, 1)} m/s within ${fmt(STOP_WITHIN_M, 1)} m ${fmt(stop)} N. Guideline forces for ${who}${team}: ${fmt(guidelineStart)} N to start or stop, ${fmt(guidelineSustained)} N to keep moving; index ${fmt(index)}.`,
      source: `${SOURCES.hseL23}; stopping distance${req.teamSize > 1 ? " and team factors applied to pushing" : ""}: ${SOURCES.heftwisePolicy}`,
    },
  );
  if (runsAway) {
    floors.push("watch");
    const steeperThan = `1 in ${fmt(1 / low, 0)}`;
    if (!braked && surface === "rail") {
      floors.push("stop");
      reasons.push({
        text: `Unbraked on ${req.surface ? "rails" : "an unstated surface (taken as rails)"}: at ${gradientText(req.gradient)} it runs away by itself if let go (anything steeper than about ${steeperThan}). Do not use an unbraked trolley here.`,
        source: `${ROLLING.rail.source}; unbraked runaway on rails is Stop: ${SOURCES.heftwisePolicy}`,
      });
      warnings.push({
        field: "braked",
        message: `The load runs away unbraked on this gradient (steeper than about ${steeperThan}): use a trolley with a working brake, tested before use.`,
      });
    } else if (!braked)
      warnings.push({
        field: "gradient",
        message: `It rolls by itself on this gradient (steeper than about ${steeperThan}): people must hold it back. Use a brake, a restraint, or a person controlling from the downhill end.`,
      });
    else if (!req.brakeOperator?.trim()) {
      reasons.push({
        text: "Braked on a gradient where it would run away: the plan must name who works the brake.",
        source: SOURCES.heftwisePolicy,
      });
      warnings.push({
        field: "brakeOperator",
        message: "Name who works the brake: on this gradient the load runs away if the brake is released.",
      });
    }
  }
  if (!req.surface)
    warnings.push({
      field: "surface",
      message:
        "Surface not stated: judged as on rails, where a load runs away on the gentlest gradient. State the surface.",
    });
  if (surface === "rail")
    reasons.push({
      text: "Trolley use on the line is governed by the infrastructure manager's rules (brakes, protection, who may use it); Heftwise does not replace them.",
      source: SOURCES.heftwisePolicy,
    });
  if (req.teamSize > MAX_TEAM_SIZE) {
    floors.push("stop");
    reasons.push({
      text: `A team of ${fmt(req.teamSize)} is more than four: use a powered aid or split the load.`,
      source: SOURCES.hseL23,
    });
  }
  if (req.distanceM !== undefined && req.distanceM > PUSH_DISTANCE_LIMIT_M) {
    floors.push("watch");
    warnings.push({
      field: "distanceM",
      message: `Pushed ${fmt(req.distanceM)} m: beyond about ${PUSH_DISTANCE_LIMIT_M} m without a break the guideline forces do not hold. Assess in more detail and plan rests.`,
    });
  }
  applyConditions(req.conditions, floors, reasons);
  if (req.rollingCoefficient !== undefined && !measured)
    warnings.push({
      field: "rollingCoefficient",
      message: `Rolling resistance ${fmt(crr)} entered instead of ${fmt(rolling.effort)}: record how it was obtained. Whether it runs away is still judged with ${fmt(low * 100, 1)} %.`,
    });

  return {
    method: "push",
    inputs: { ...req, rollingCoefficient: crr, slopeAngleDeg: (Math.atan(req.gradient) * 180) / Math.PI },
    sustainedForceN: sustained,
    startForceN: start,
    holdForceN: hold,
    stopForceN: stop,
    runsAway,
    effortCoefficient: crr,
    runawayCoefficient: low,
    guidelineSustainedN: guidelineSustained,
    guidelineStartN: guidelineStart,
    perPersonSustainedN: sustained / req.teamSize,
    perPersonStartN: start / req.teamSize,
    forceSource: measured ? "measured" : "estimated",
    limit: guidelineSustained,
    index,
    band: worstBand(floors),
    reasons,
    warnings,
    rulesVersion: RULES_VERSION,
  };
}
