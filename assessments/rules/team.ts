/**
 * Team handling (HSE L23): a team of two can handle about two-thirds of the sum of its members'
 * capabilities, a team of three about half; teams of more than four are unlikely to work.
 * Heftwise policy: a team of four is taken at one half, like three (the guidance gives no figure
 * for four); a team over four keeps the one-half factor for the arithmetic and is banded `stop`.
 */
export const MAX_TEAM_SIZE = 4;

export function teamFactor(teamSize: number): number {
  if (teamSize <= 1) return 1;
  if (teamSize === 2) return 2 / 3;
  return 1 / 2;
}

/** The team's capacity from one member's guideline figure. */
export function teamCapacity(individualGuideline: number, teamSize: number): number {
  return individualGuideline * teamSize * teamFactor(teamSize);
}
