/**
 * Multi-leg slings by the uniform-load method (EN 818-4 for chain; the same mode factors appear for
 * other sling types in suppliers' tables):
 *   single leg 1.0 (choked 0.8); 2-leg β ≤ 45° 1.4, 45° < β ≤ 60° 1.0;
 *   3- and 4-leg β ≤ 45° 2.1, 45° < β ≤ 60° 1.5; β (from vertical) never above 60°.
 * Leg tension T = W / (n·cos β), with a 4-leg sling taken as only 3 legs sharing the load.
 * Heftwise policy (common practice, no published source at hand): a choked hitch on a multi-leg
 * sling also takes the 0.8 choke factor.
 */
export const MAX_SLING_ANGLE_DEG = 60;
export const CHOKE_FACTOR = 0.8;

export type Hitch = "straight" | "choked";

export function modeFactor(legs: number, angleFromVerticalDeg: number, hitch: Hitch): number {
  const choke = hitch === "choked" ? CHOKE_FACTOR : 1;
  if (legs === 1) return choke;
  const wide = angleFromVerticalDeg > 45;
  if (legs === 2) return (wide ? 1.0 : 1.4) * choke;
  return (wide ? 1.5 : 2.1) * choke;
}

/** Legs taken to share the load: a 4-leg sling counts as 3. */
export function legsSharing(legs: number): number {
  return Math.min(legs, 3);
}

export function legTension(load: number, legs: number, angleFromVerticalDeg: number): number {
  return load / (legsSharing(legs) * Math.cos((angleFromVerticalDeg * Math.PI) / 180));
}
