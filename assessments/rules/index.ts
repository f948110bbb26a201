/**
 * The rules engine's public face: `score(request)` for any method, and `scoreMany` for a batch
 * whose invalid entries answer with an error in place.
 */
import { scoreNiosh, type NioshResult } from "./niosh";
import { scoreComposite, type CompositeResult } from "./niosh-composite";
import { scoreFilter, type FilterResult } from "./filter";
import { scorePush, type PushResult } from "./push";
import { scoreLift, type LiftResult } from "../lift-plan/lift";
import { scoreRequestSchema, toIssues, type RequestIssue, type ScoreRequest } from "./request";

export type ScoreResult = NioshResult | CompositeResult | FilterResult | PushResult | LiftResult;

export interface ScoreError {
  error: { message: string; issues: RequestIssue[] };
}

/** Scores a request that has already been validated. */
export function score(request: ScoreRequest): ScoreResult {
  switch (request.method) {
    case "niosh":
      return scoreNiosh(request);
    case "niosh-composite":
      return scoreComposite(request);
    case "filter":
      return scoreFilter(request);
    case "push":
      return scorePush(request);
    case "lift":
      return scoreLift(request);
  }
}

/** Validates then scores an unknown value; an invalid request answers with its issues. */
export function scoreUnknown(input: unknown): ScoreResult | ScoreError {
  const parsed = scoreRequestSchema.safeParse(input);
  if (!parsed.success) return { error: { message: "Invalid scoring request", issues: toIssues(parsed.error) } };
  return score(parsed.data);
}

export function isScoreError(x: ScoreResult | ScoreError): x is ScoreError {
  return "error" in x;
}

export { RULES_VERSION } from "./version";
export { worstBand, bandForIndex } from "./bands";
export type { Band, Reason, Warning } from "./types";
export type { ScoreRequest } from "./request";
