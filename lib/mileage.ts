/**
 * Railway mileages as the British railway writes them: miles and chains from the line's zero point,
 * with yards where needed (80 chains to the mile, 22 yards to the chain; common practice, no published
 * source needed beyond the units' definitions). "14m 22ch", or a stretch "17m 05ch – 17m 15ch".
 * Decimal miles are refused: "14.22" could mean 14 miles 22 chains or 14.22 miles, some 160 m apart.
 */
export interface Mileage {
  miles: number;
  chains: number;
  yards: number;
}

export const CHAINS_PER_MILE = 80;
export const YARDS_PER_CHAIN = 22;

const POINT =
  /^(\d{1,3})\s*(?:m|mi|mile|miles)\s*(\d{1,2})\s*(?:c|ch|chain|chains)(?:\s*(\d{1,2})\s*(?:y|yd|yds|yard|yards))?$/i;

function parsePoint(text: string): Mileage | null {
  const m = POINT.exec(text.trim());
  if (!m) return null;
  const point = { miles: Number(m[1]), chains: Number(m[2]), yards: m[3] ? Number(m[3]) : 0 };
  return point.chains < CHAINS_PER_MILE && point.yards < YARDS_PER_CHAIN ? point : null;
}

/** "14m 22ch", "14m 22ch 10yd". */
export function formatMileage({ miles, chains, yards }: Mileage): string {
  return `${miles}m ${String(chains).padStart(2, "0")}ch${yards ? ` ${yards}yd` : ""}`;
}

/** Yards from the zero point, to compare two mileages. */
export const inYards = ({ miles, chains, yards }: Mileage) =>
  (miles * CHAINS_PER_MILE + chains) * YARDS_PER_CHAIN + yards;

/**
 * A mileage or a stretch between two, written any usual way ("14m22ch", "14 miles 22 chains",
 * "17m 5ch to 17m 15ch"), in the one form Heftwise shows; null when it is not miles and chains.
 */
export function normaliseMileage(text: string): string | null {
  const parts = text
    .trim()
    .split(/\s*(?:–|—|-|\bto\b)\s*/i)
    .filter((p) => p !== "");
  if (parts.length < 1 || parts.length > 2) return null;
  const points = parts.map(parsePoint);
  if (points.some((p) => p === null)) return null;
  const [from, to] = points as Mileage[];
  if (to && inYards(to) === inYards(from)) return formatMileage(from);
  return to ? `${formatMileage(from)} – ${formatMileage(to)}` : formatMileage(from);
}

export const MILEAGE_HINT = "Miles and chains, e.g. 14m 22ch, or 17m 05ch – 17m 15ch";
