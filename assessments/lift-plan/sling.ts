/**
 * Sling assemblies by the uniform-load method. Mode factors (the assembly's limit as a multiple of
 * one leg's working load limit):
 * - multi-leg, straight: 1 leg 1.0; 2-leg β ≤ 45° 1.4, 45° < β ≤ 60° 1.0; 3- and 4-leg β ≤ 45° 2.1,
 *   45° < β ≤ 60° 1.5 [pub, EN 818-4 as in suppliers' tables; REFERENCES.md §4];
 * - choked: × 0.8, single or multi-leg; basket (one sling under the load, both ends on the hook):
 *   parallel legs 2.0, β 0–45° 1.4, 45–60° 1.0; endless chain sling 1.6, choked 1.28
 *   [from memory, as tabled for textile slings in EN 1492-1 and for chain in EN 818-4 suppliers'
 *   tables; REFERENCES.md §7].
 * β is measured from vertical and never above 60°. Leg tension T = W / (n·cos β), with a 4-leg sling
 * taken as only 3 legs sharing the load [pub] and a basket or endless sling as 2 parts.
 * The limit **marked** on the assembly governs when it is lower than the computed one (tables round
 * down to preferred numbers).
 */
export const MAX_SLING_ANGLE_DEG = 60;
export const CHOKE_FACTOR = 0.8;

export const HITCHES = ["straight", "choked", "basket", "endless", "endless-choked"] as const;
export type Hitch = (typeof HITCHES)[number];
export const HITCH_LABELS: Record<Hitch, string> = {
  straight: "straight legs",
  choked: "choked",
  basket: "basket (one sling under the load)",
  endless: "endless sling",
  "endless-choked": "endless sling, choked",
};
/** Hitches made with one sling: the assembly has one leg. */
export const SINGLE_SLING_HITCHES: readonly Hitch[] = ["basket", "endless", "endless-choked"];

export function modeFactor(legs: number, angleFromVerticalDeg: number, hitch: Hitch): number {
  const wide = angleFromVerticalDeg > 45;
  switch (hitch) {
    case "basket":
      return angleFromVerticalDeg === 0 ? 2.0 : wide ? 1.0 : 1.4;
    case "endless":
      return 1.6;
    case "endless-choked":
      return 1.6 * CHOKE_FACTOR;
  }
  const choke = hitch === "choked" ? CHOKE_FACTOR : 1;
  if (legs === 1) return choke;
  if (legs === 2) return (wide ? 1.0 : 1.4) * choke;
  return (wide ? 1.5 : 2.1) * choke;
}

/** Legs (or parts of one sling) taken to share the load: a 4-leg sling counts as 3, a basket or endless sling as 2. */
export function legsSharing(legs: number, hitch: Hitch = "straight"): number {
  if (SINGLE_SLING_HITCHES.includes(hitch)) return 2;
  return Math.min(legs, 3);
}

export function legTension(
  load: number,
  legs: number,
  angleFromVerticalDeg: number,
  hitch: Hitch = "straight",
): number {
  return load / (legsSharing(legs, hitch) * Math.cos((angleFromVerticalDeg * Math.PI) / 180));
}
