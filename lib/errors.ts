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

/** NUL, or half of a UTF-16 surrogate pair: text PostgreSQL cannot store. */
const UNSTORABLE = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
const UNSTORABLE_MESSAGE = "Contains a character that cannot be stored (a NUL or a broken character): remove it";
const MAX_SCAN_DEPTH = 64;

/** Every string in the input that cannot be stored, by path (stops at a depth no form produces). */
export function unstorableText(input: unknown): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const visit = (value: unknown, path: string[], depth: number) => {
    if (typeof value === "string") {
      if (UNSTORABLE.test(value)) issues.push({ path: path.join("."), message: UNSTORABLE_MESSAGE });
    } else if (value && typeof value === "object" && depth < MAX_SCAN_DEPTH && issues.length < 20) {
      for (const [k, v] of Object.entries(value)) {
        if (UNSTORABLE.test(k)) issues.push({ path: [...path, "(key)"].join("."), message: UNSTORABLE_MESSAGE });
        visit(v, [...path, k], depth + 1);
      }
    }
  };
  visit(input, [], 0);
  return issues;
}

/**
 * Parses with a zod schema or throws a 422 with the field messages. Text that cannot be stored is
 * refused first, for every schema alike: one check at the root rather than one per field.
 */
export function parseOrThrow<T>(schema: z.ZodType<T>, input: unknown, message?: string): T {
  const unstorable = unstorableText(input);
  if (unstorable.length) throw new AppError("validation", message ?? "Some fields need attention", unstorable);
  const parsed = schema.safeParse(input);
  if (!parsed.success) throw AppError.validation(parsed.error, message);
  return parsed.data;
}

/** As `parseOrThrow`, for schemas with asynchronous checks (a drawn signature's decoding). */
export async function parseOrThrowAsync<T>(schema: z.ZodType<T>, input: unknown, message?: string): Promise<T> {
  const unstorable = unstorableText(input);
  if (unstorable.length) throw new AppError("validation", message ?? "Some fields need attention", unstorable);
  const parsed = await schema.safeParseAsync(input);
  if (!parsed.success) throw AppError.validation(parsed.error, message);
  return parsed.data;
}

/**
 * The AppError an error stands for, or null for one that is truly unexpected. A database's refusal
 * of the data (PostgreSQL class 22: a value it cannot store) is the caller's input: 422, never 500;
 * a unique key already taken is a 409.
 */
export function toAppError(err: unknown): AppError | null {
  if (err instanceof AppError) return err;
  const code = databaseCode(err);
  if (code?.startsWith("22"))
    return new AppError(
      "validation",
      "Some of the data could not be stored: check for unusual characters or numbers out of range",
    );
  if (code === "23505") return new AppError("conflict", "That already exists");
  return null;
}

/** The SQLSTATE of a database error, from the driver's error or the ORM's wrapper around it. */
export function databaseCode(err: unknown): string | null {
  for (let e = err as { code?: unknown; cause?: unknown } | undefined, i = 0; e && i < 4; e = e.cause as typeof e, i++)
    if (typeof e.code === "string" && /^[0-9A-Z]{5}$/.test(e.code)) return e.code;
  return null;
}

/** A unique key already taken (PostgreSQL 23505), from the driver's error or the ORM's wrapper. */
export const isUniqueViolation = (err: unknown) => databaseCode(err) === "23505";
