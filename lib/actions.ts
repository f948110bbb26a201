/**
 * What every server action returns: success with an optional message, or the AppError as plain
 * data the form can show (field messages included). Unexpected errors are logged, not shown.
 */
import { toAppError, type ErrorCode, type FieldIssue } from "./errors";

export type ActionResult<T = unknown> =
  { ok: true; message?: string; data?: T } | { ok: false; code: ErrorCode; message: string; issues?: FieldIssue[] };

export async function runAction<T>(fn: () => Promise<{ message?: string; data?: T } | void>): Promise<ActionResult<T>> {
  try {
    const result = (await fn()) ?? {};
    return { ok: true, ...result };
  } catch (err) {
    const known = toAppError(err);
    if (known) return { ok: false, code: known.code, message: known.message, issues: known.issues };
    console.error(err);
    return {
      ok: false,
      code: "internal",
      message: "Something went wrong on the server. Nothing was changed; try again.",
    };
  }
}
