/**
 * "What would bring it to clear": concrete changes, computed from the same rules, that would put a
 * task within guidance. Pure, for the live score in the wizard.
 */
import { UTILISATION } from "../lift-plan/lift";
import { fmt } from "../rules/format";
import { guidelineWeight } from "../rules/filter";
import { GUIDELINE_FORCE_N, slopeForce, DEFAULT_ROLLING_COEFFICIENT, START_RESISTANCE_RATIO } from "../rules/push";
import { MAX_TEAM_SIZE, teamCapacity } from "../rules/team";
import type { TaskScore } from "./score-task";

export function adviceForClear(score: TaskScore): string[] {
  const out: string[] = [];
  const { niosh, filter, push, lift } = score.results;

  if (niosh && niosh.band !== "clear") {
    if (niosh.li !== null) {
      out.push(`The lifting equation is clear at ${fmt(niosh.limit)} kg or less.`);
      const end = niosh.destination && niosh.li === niosh.destination.li ? niosh.inputs.destination : niosh.inputs.origin;
      const governing = niosh.destination && niosh.li === niosh.destination.li ? niosh.destination : niosh.origin;
      const neededHm = governing.hm / niosh.li;
      const h = 25 / neededHm;
      if (neededHm <= 1 && end.h > h) out.push(`Bring the load ${fmt(end.h - Math.max(h, 25), 0)} cm closer to the body (H ${fmt(Math.max(h, 25), 0)} cm).`);
    } else out.push("Bring every hand position within the equation's range, or use a lifting aid.");
  }

  if (filter && filter.band !== "clear" && filter.index !== null) {
    const { sex, zone, reach, teamSize } = filter.inputs;
    const perPerson = guidelineWeight(sex, zone, reach) * filter.reductionFactor;
    for (let n = teamSize + 1; n <= MAX_TEAM_SIZE; n++) {
      if (teamCapacity(perPerson, n) >= filter.inputs.load) {
        out.push(`A team of ${n} brings the filter to clear (team guideline ${fmt(teamCapacity(perPerson, n))} kg).`);
        break;
      }
    }
    if (reach === "extended") {
      const close = teamCapacity(guidelineWeight(sex, zone, "close") * filter.reductionFactor, teamSize);
      if (close >= filter.inputs.load) out.push("Holding the load close to the body brings the filter to clear.");
    }
    if (zone !== "knuckle-to-elbow") {
      const best = teamCapacity(guidelineWeight(sex, "knuckle-to-elbow", reach) * filter.reductionFactor, teamSize);
      if (best >= filter.inputs.load) out.push("Handling between knuckle and elbow height (raise the load on a stand) brings the filter to clear.");
    }
    if (out.length === 0 || filter.index > 2) out.push("Use a mechanical aid or split the load.");
  }

  if (push && push.band !== "clear") {
    const individual = GUIDELINE_FORCE_N[push.inputs.sex];
    for (let n = push.inputs.teamSize + 1; n <= MAX_TEAM_SIZE; n++) {
      if (teamCapacity(individual.sustained, n) >= push.sustainedForceN && teamCapacity(individual.start, n) >= push.startForceN) {
        out.push(`A team of ${n} brings pushing to clear.`);
        break;
      }
    }
    if (push.inputs.gradient > 0 && push.forceSource === "estimated") {
      const crr = push.inputs.rollingCoefficient ?? DEFAULT_ROLLING_COEFFICIENT;
      const level = slopeForce(push.inputs.mass, 0, crr * START_RESISTANCE_RATIO);
      if (level <= teamCapacity(individual.start, push.inputs.teamSize)) out.push("On the level it would be clear: avoid the gradient or winch the load up it.");
    }
    if (out.length === 0) out.push("Use a powered trolley or a winch.");
  }

  if (lift && lift.band !== "clear") {
    if (lift.utilisation > UTILISATION.clearUpTo) out.push(`A machine rated at least ${fmt(lift.hookLoad / UTILISATION.clearUpTo, 0)} kg at this radius, or a shorter radius.`);
    if (!lift.slingOk) out.push(`Sling legs rated at least ${fmt(lift.legTension, 0)} kg each, or a narrower angle.`);
    if (lift.examinations.some((e) => e.status !== "in-date")) out.push("Have the equipment thoroughly examined before the lift.");
  }
  return out;
}
