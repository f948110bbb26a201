/**
 * Numbers for reasons and warnings, to at most `dp` decimals without trailing zeros.
 * Built from an integer and a precomputed decimal part, because general number-to-string
 * conversion dominated the cost of a scoring (see `npm run bench:rules`).
 */
const DECIMALS_2 = Array.from({ length: 100 }, (_, i) =>
  i === 0 ? "" : `.${String(i).padStart(2, "0").replace(/0$/, "")}`,
);
const DECIMALS_1 = Array.from({ length: 10 }, (_, i) => (i === 0 ? "" : `.${i}`));

export function fmt(x: number, dp: 0 | 1 | 2 = 2): string {
  if (!(Math.abs(x) < 1e9)) return String(x);
  const scale = dp === 2 ? 100 : dp === 1 ? 10 : 1;
  const scaled = Math.round(Math.abs(x) * scale);
  const whole = Math.floor(scaled / scale);
  const frac = scaled - whole * scale;
  const sign = x < 0 && scaled !== 0 ? "-" : "";
  return sign + whole + (dp === 2 ? DECIMALS_2[frac] : dp === 1 ? DECIMALS_1[frac] : "");
}
