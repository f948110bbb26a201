/**
 * Reading numbers and text from CSV cells without guessing. A mass is a safety value: "12,5" must
 * never become 125 kg, nor "1.250" 1.25 kg when the writer meant 1 250. Pure.
 *
 * Accepted: plain decimals ("12", "12.5", "0.125") and a decimal comma where it cannot be a
 * thousands separator ("12,5", "0,125", "1,2500"). Refused, with a message: a comma or dot followed
 * by exactly three digits after a leading 1–3 digits ("1,250", "1.250": thousands or decimals?),
 * thousands separators, spaces inside, signs, exponents, hex and other non-decimal forms, units.
 */
export type CellNumber = { value: number | null } | { error: string };

const PLAIN = /^\d+(\.\d+)?$/;
const DECIMAL_COMMA = /^\d+,\d+$/;
const AMBIGUOUS = /^[1-9]\d{0,2}[.,]\d{3}$/;

export function parseCsvNumber(raw: string | undefined): CellNumber {
  const text = (raw ?? "").trim();
  if (text === "") return { value: null };
  if (AMBIGUOUS.test(text)) {
    const [whole, part] = text.split(/[.,]/);
    return {
      error: `"${text}" could mean ${whole}${part} or ${whole}.${part}: write it without a separator (${whole}${part}) or with a decimal point (${whole}.${part})`,
    };
  }
  if (PLAIN.test(text)) return { value: Number(text) };
  if (DECIMAL_COMMA.test(text)) return { value: Number(text.replace(",", ".")) };
  if (/^\d+(\.\d+)?\s*[a-zA-Z]+$/.test(text)) return { error: `"${text}": write the number only, without the unit` };
  if (/^\d{1,3}([, .]\d{3})+([.,]\d+)?$/.test(text))
    return { error: `"${text}": write the number without thousands separators` };
  return { error: `"${text}" is not a number Heftwise can read: use digits with a decimal point, such as 12.5` };
}

/** Characters that make a spreadsheet treat a cell as a formula. */
const FORMULA_START = /^[=+\-@\t\r]/;

/** A note for a text cell a spreadsheet would run as a formula; null when it would not. */
export function formulaNote(text: string | undefined): string | null {
  return text && FORMULA_START.test(text)
    ? `starts with "${text[0] === "\t" ? "tab" : text[0] === "\r" ? "return" : text[0]}": a spreadsheet may run it as a formula. It is stored as text, and written with a leading apostrophe in exports.`
    : null;
}

/** Text safe to write into a CSV that a spreadsheet will open: a formula-like cell gets a leading apostrophe. */
export function neutraliseFormula(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}
