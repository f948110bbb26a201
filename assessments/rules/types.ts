/**
 * Shapes shared by every scoring method. The engine is pure TypeScript with no imports from
 * frameworks or the database, so the same code scores on the server, in the CLI and in the browser.
 */

/** Heftwise's four bands, from best to worst. */
export const BANDS = ["clear", "watch", "act", "stop"] as const;
export type Band = (typeof BANDS)[number];

/** A plain-language statement about the result and the published source it rests on. */
export interface Reason {
  text: string;
  source: string;
}

/** An input outside a method's range, and what the method did about it. Never silent. */
export interface Warning {
  field: string;
  message: string;
  /**
   * The method cannot judge the operation with this input (a multiplier of 0, hands below the
   * standing surface, no guideline left). A result carrying such a warning is never Clear.
   */
  cannotJudge?: true;
}

export type Sex = "male" | "female";
export type Units = "metric" | "us";
export type Coupling = "good" | "fair" | "poor";

/** Common fields of every result. */
export interface ResultBase {
  band: Band;
  reasons: Reason[];
  warnings: Warning[];
  rulesVersion: string;
}
