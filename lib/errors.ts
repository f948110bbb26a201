/**
 * The one error type the server raises on purpose. Each code maps to one HTTP status; route
 * handlers and server actions turn it into `{"error": {"code", "message", "issues"?}}` and never
 * show a stack trace.
 */
import type { z } from "zod";

export const ERROR_STATUS = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  validation: 422,
  rate_limited: 429,
  internal: 500,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export interface FieldIssue {
  path: string;
  message: string;
}

export class AppError extends Error {
  constructor(
    public readonly code: ErrorCode,
    message: string,
    public readonly issues?: FieldIssue[],
  ) {
    super(message);
    this.name = "AppError";
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }

  toJSON() {
    return { error: { code: this.code, message: this.message, ...(this.issues ? { issues: this.issues } : {}) } };
  }

  static validation(error: z.ZodError, message = "Some fields need attention") {
    return new AppError(
      "validation",
      message,
      error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })),
    );
  }

  /** Another organisation's record, or none: the same answer, never a hint that it exists. */
  static notFound(what = "Record") {
    return new AppError("not_found", `${what} not found`);
  }
}

/** Parses with a zod schema or throws a 422 with the field messages. */
export function parseOrThrow<T>(schema: z.ZodType<T>, input: unknown, message?: string): T {
  const parsed = schema.safeParse(input);
  if (!parsed.success) throw AppError.validation(parsed.error, message);
  return parsed.data;
}
