/**
 * The browser's one way to call Heftwise's API. Every answer comes back as the data or as an
 * `ApiError` with a message a person can act on: the connection failed (nothing was sent, or the
 * reply was lost), the server answered something that is not JSON (a proxy's error page), or the
 * API refused with its own `{"error": {code, message, issues}}` (field issues kept for the form).
 */
import type { FieldIssue } from "./errors";

export class ApiError extends Error {
  constructor(
    message: string,
    /** The HTTP status; 0 when no answer arrived. */
    public readonly status: number,
    public readonly code: string,
    public readonly issues: FieldIssue[] = [],
  ) {
    super(message);
    this.name = "ApiError";
  }

  /** No answer arrived: the request may be tried again later. */
  get offline(): boolean {
    return this.status === 0;
  }

  /** Worth sending again later (no answer, a timeout, throttled, the server or a proxy failing); a refusal is not. */
  get retryable(): boolean {
    return (
      this.status === 0 || this.status === 408 || this.status === 429 || this.status >= 500 || this.code === "bad_reply"
    );
  }
}

export interface RequestOptions {
  method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** Sent as JSON with its content type. */
  json?: unknown;
  /** Sent as is (a FormData for uploads, a string with `contentType`). */
  body?: BodyInit;
  contentType?: string;
  headers?: Record<string, string>;
  signal?: AbortSignal;
}

const NO_CONNECTION = "Heftwise could not be reached: check the connection and try again.";

export async function apiRequest<T = unknown>(path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { accept: "application/json", ...options.headers };
  if (options.json !== undefined) headers["content-type"] = "application/json";
  else if (options.contentType) headers["content-type"] = options.contentType;
  let response: Response;
  try {
    response = await fetch(path, {
      method: options.method ?? (options.json !== undefined || options.body !== undefined ? "POST" : "GET"),
      headers,
      body: options.json !== undefined ? JSON.stringify(options.json) : options.body,
      signal: options.signal,
    });
  } catch (err) {
    if ((err as Error).name === "AbortError") throw err;
    throw new ApiError(NO_CONNECTION, 0, "network");
  }
  if (response.status === 204) return undefined as T;
  const text = await response.text().catch(() => null);
  if (text === null) throw new ApiError(NO_CONNECTION, 0, "network");
  let body: unknown;
  try {
    body = text === "" ? undefined : JSON.parse(text);
  } catch {
    throw new ApiError(
      `Heftwise answered unexpectedly (HTTP ${response.status}). Nothing on this page was lost: try again in a moment.`,
      response.status,
      "bad_reply",
    );
  }
  if (!response.ok) {
    const error = (body as { error?: { code?: string; message?: string; issues?: FieldIssue[] } } | undefined)?.error;
    throw new ApiError(
      error?.message ?? `The request was refused (HTTP ${response.status}).`,
      response.status,
      error?.code ?? "http_error",
      Array.isArray(error?.issues) ? error.issues : [],
    );
  }
  return body as T;
}

/** The message to show for any error a request raised. */
export const messageOf = (err: unknown): string => (err instanceof Error ? err.message : String(err));

/** Where no form field can show it: the first field issue's message, or else the error's own. */
export const problemOf = (err: unknown): string =>
  err instanceof ApiError && err.issues[0] ? err.issues[0].message : messageOf(err);

/**
 * Puts each field issue of a refused request on its form field (react-hook-form's `setError`), and
 * returns the issues no field of the form takes, for a message beside the form.
 */
export function applyFieldIssues(
  err: unknown,
  setError: (name: never, error: { type: string; message: string }) => void,
  fields: readonly string[],
): FieldIssue[] {
  if (!(err instanceof ApiError)) return [];
  const unplaced: FieldIssue[] = [];
  for (const issue of err.issues) {
    if (fields.includes(issue.path)) setError(issue.path as never, { type: "server", message: issue.message });
    else unplaced.push(issue);
  }
  return unplaced;
}
