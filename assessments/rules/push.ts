/**
 * Pushing and pulling a wheeled load (track trolley, wheeled case, barrow), hands between knuckle
 * and shoulder height.
 *
 *   sustained force  F = m·g·(sin θ + C_rr·cos θ),  θ = atan(gradient)
 *
 * The rolling coefficient defaults to 0.02: HSE's "at least 2 % of the load" for a well-maintained
 * aid on level ground (L23). No published coefficient for small track trolleys exists, so a force
 * measured with a push-pull gauge overrides both figures when given.
 * Heftwise policy for the starting force (no published source): breakaway resistance is taken as
 * twice the rolling resistance, F_start = m·g·(sin θ + 2·C_rr·cos θ).
 */
import { bandForIndex, GUIDELINE_THRESHOLDS, worstBand } from "./bands";
import { fmt } from "./format";
import { SOURCES } from "./sources";
import { MAX_TEAM_SIZE, teamCapacity } from "./team";
import type { Band, Reason, ResultBase, Sex, Warning } from "./types";
import { RULES_VERSION } from "./version";

export const GRAVITY = 9.80665;
export const DEFAULT_ROLLING_COEFFICIENT = 0.02;
export const START_RESISTANCE_RATIO = 2;
/** More than about 20 m without a break needs a detailed assessment (L23). */
export const PUSH_DISTANCE_LIMIT_M = 20;

/** Guideline forces in newtons (L23: men 20 kg ≈ 200 N to start, 10 kg ≈ 100 N to keep moving; women 15 / 7 kg). */
export const GUIDELINE_FORCE_N: Record<Sex, { start: number; sustained: number }> = {
  male: { start: 200, sustained: 100 },
  female: { start: 150, sustained: 70 },
};

export interface PushRequest {
  method: "push";
  /** Mass of the loaded trolley or barrow (kg). */
  mass: number;
  /** Rise ÷ run: 1 in 12 is 0.0833. Negative for a downhill push (the runaway risk is warned). */
  gradient: number;
  rollingCoefficient?: number;
  sex: Sex;
  teamSize: number;
  distanceM?: number;
  /** Force measured with a push-pull gauge (N): overrides the estimate for starting and keeping moving. */
  measuredForceN?: number;
}

export interface PushResult extends ResultBase {
  method: "push";
  inputs: PushRequest & { rollingCoefficient: number; slopeAngleDeg: number };
  sustainedForceN: number;
  startForceN: number;
  /** The team's guideline forces (N). */
  guidelineSustainedN: number;
  guidelineStartN: number;
  perPersonSustainedN: number;
  perPersonStartN: number;
  forceSource: "estimated" | "measured";
  limit: number;
  index: number;
}

export function slopeForce(mass: number, gradient: number, resistance: number): number {
  const theta = Math.atan(gradient);
  return mass * GRAVITY * (Math.sin(theta) + resistance * Math.cos(theta));
}

export function scorePush(req: PushRequest): PushResult {
  const crr = req.rollingCoefficient ?? DEFAULT_ROLLING_COEFFICIENT;
  const measured = req.measuredForceN !== undefined;
  // Downhill the slope helps; the force to hold back a runaway is not this method's business,
  // so the pushing force is never taken below zero (and a warning says why).
  const sustained = measured
    ? req.measuredForceN!
    : Math.max(0, slopeForce(req.mass, req.gradient, crr));
  const start = measured
    ? req.measuredForceN!
    : Math.max(0, slopeForce(req.mass, req.gradient, crr * START_RESISTANCE_RATIO));
  const individual = GUIDELINE_FORCE_N[req.sex];
  const guidelineStart = teamCapacity(individual.start, req.teamSize);
  const guidelineSustained = teamCapacity(individual.sustained, req.teamSize);
  const index = Math.max(start / guidelineStart, sustained / guidelineSustained);

  const reasons: Reason[] = [];
  const warnings: Warning[] = [];
  const floors: Band[] = [bandForIndex(index, GUIDELINE_THRESHOLDS)];
  const who = req.sex === "male" ? "men" : "women";

  reasons.push(
    measured
      ? { text: `Measured force ${fmt(sustained)} N used for starting and for keeping moving.`, source: "Push-pull gauge reading entered by the assessor" }
      : {
          text: `Estimated force to keep ${fmt(req.mass)} kg moving on a gradient of ${fmt(req.gradient * 100, 1)} % with rolling resistance ${fmt(crr * 100, 1)} % of the weight: ${fmt(sustained)} N; to start it: ${fmt(start)} N.`,
          source: `${SOURCES.hseL23} (2 % of the load on the level); starting force: ${SOURCES.heftwisePolicy}`,
        },
    {
      text: `Guideline forces for ${who}${req.teamSize > 1 ? `, team of ${fmt(req.teamSize)}` : ""}: ${fmt(guidelineStart)} N to start or stop, ${fmt(guidelineSustained)} N to keep moving; index ${fmt(index)}.`,
      source: req.teamSize > 1 ? `${SOURCES.hseL23}; team factors applied to pushing: ${SOURCES.heftwisePolicy}` : SOURCES.hseL23,
    },
  );
  if (req.teamSize > MAX_TEAM_SIZE) {
    floors.push("stop");
    reasons.push({ text: `A team of ${fmt(req.teamSize)} is more than four: use a powered aid or split the load.`, source: SOURCES.hseL23 });
  }
  if (req.distanceM !== undefined && req.distanceM > PUSH_DISTANCE_LIMIT_M) {
    floors.push("watch");
    warnings.push({
      field: "distanceM",
      message: `Pushed ${fmt(req.distanceM)} m: beyond about ${PUSH_DISTANCE_LIMIT_M} m without a break the guideline forces do not hold. Assess in more detail and plan rests.`,
    });
  }
  if (req.gradient < 0)
    warnings.push({
      field: "gradient",
      message: "Downhill: the load can run away. Plan braking, a restraint or a person controlling from the downhill end.",
    });
  if (crr !== DEFAULT_ROLLING_COEFFICIENT && !measured)
    warnings.push({
      field: "rollingCoefficient",
      message: `Rolling resistance ${fmt(crr)} entered instead of the 2 % guideline figure: record how it was obtained.`,
    });

  return {
    method: "push",
    inputs: { ...req, rollingCoefficient: crr, slopeAngleDeg: (Math.atan(req.gradient) * 180) / Math.PI },
    sustainedForceN: sustained,
    startForceN: start,
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
