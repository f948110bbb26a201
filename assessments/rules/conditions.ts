/**
 * The working environment of a handling task. HSE L23 lists the working environment as one of the
 * headings of every assessment (uneven or unstable floors, variations in level, space constraints,
 * extremes of temperature, poor lighting, strong air movements) and PPE that restricts movement among
 * the other factors [pub, REFERENCES.md §2]; lineside, ballast and the cess, limited clearances and
 * a position of safety to reach make them common (common practice, no published source).
 *
 * No published method puts a number on them, so Heftwise policy: each condition present lifts the
 * task to at least Watch, with a reason naming it and the controls a practitioner would apply.
 */
import type { Band, Reason } from "./types";
import { SOURCES } from "./sources";

export const CONDITIONS = [
  "uneven-ground",
  "slope-or-steps",
  "restricted-posture",
  "wind-on-panels",
  "hot-or-cold",
  "poor-light",
  "restrictive-ppe",
] as const;
export type Condition = (typeof CONDITIONS)[number];

export const CONDITION_FLOOR: Band = "watch";

export const CONDITION_TEXT: Record<Condition, { label: string; controls: string; remedy: string }> = {
  "uneven-ground": {
    label: "uneven or unstable ground (ballast, cess)",
    controls:
      "walk and clear the route first, lay walkway boards where the cess is soft or broken, boots with ankle support",
    remedy: "Lay boards or a cleared walkway along the route, so the ground is even underfoot",
  },
  "slope-or-steps": {
    label: "slopes or steps on the way",
    controls:
      "avoid carrying on steps, use a ramp or pass the load up, the heavier end uphill with the stronger person below",
    remedy: "Route round the slope or steps, or pass the load over them with a ramp",
  },
  "restricted-posture": {
    label: "restricted headroom or space to move",
    controls: "clear the space first, handle nearer the opening, smaller parts, rotate the work",
    remedy: "Clear enough space to stand upright and turn the feet",
  },
  "wind-on-panels": {
    label: "wind on large light panels or covers",
    controls: "handle in pairs, stop above the wind speed the method sets, keep panels low and edge-on to the wind",
    remedy: "Handle the panels only in still air (set a stop wind speed in the plan)",
  },
  "hot-or-cold": {
    label: "heat, cold or wet",
    controls: "gloves with grip, warm-up, rest breaks and drinks, dry the load's grip points",
    remedy: "Do the handling at a milder time of day or under cover",
  },
  "poor-light": {
    label: "poor light",
    controls:
      "portable lighting along the route and at the place of work, head torches, walk the route in the light first",
    remedy: "Light the route and the place of work, or do it in daylight",
  },
  "restrictive-ppe": {
    label: "PPE that restricts movement or grip",
    controls: "gloves that grip, PPE sized to the person, shorter spells",
    remedy: "Choose PPE that does not restrict movement or grip for this task",
  },
};

/** Adds each condition present as a reason and a floor of Watch. */
export function applyConditions(conditions: readonly Condition[] | undefined, floors: Band[], reasons: Reason[]): void {
  if (!conditions?.length) return;
  floors.push(CONDITION_FLOOR);
  for (const c of new Set(conditions))
    reasons.push({
      text: `Working conditions: ${CONDITION_TEXT[c].label}. At least Watch; controls: ${CONDITION_TEXT[c].controls}.`,
      source: `${SOURCES.hseL23} (working environment); at least Watch: ${SOURCES.heftwisePolicy}`,
    });
}
