/**
 * Route handler plumbing: read a body safely (type, a byte limit enforced while reading, syntax),
 * and turn any AppError into its status and `{"error": {...}}` body. Handlers stay thin: parse,
 * authorize, call the domain.
 */
import { AsyncLocalStorage } from "node:async_hooks";
import { NextResponse } from "next/server";
import { config } from "./config";
import { AppError, toAppError } from "./errors";

export const MAX_JSON_BYTES = 1_000_000;

const tooLarge = (maxBytes: number) =>
  new AppError("payload_too_large", `The body is larger than ${formatBytes(maxBytes)}`);
const formatBytes = (n: number) =>
  n >= 1024 * 1024 ? `${Math.round(n / 1024 / 1024)} MB` : `${Math.round(n / 1000)} kB`;

/**
 * The body's bytes, read as a stream and abandoned as soon as it passes `maxBytes` (413): a body
 * without a Content-Length (chunked) is never buffered whole. A declared length over the limit is
 * refused before reading.
 */
export async function readBodyBytes(request: Request, maxBytes: number): Promise<Uint8Array> {
  if (Number(request.headers.get("content-length") ?? "0") > maxBytes) throw tooLarge(maxBytes);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

const requireType = (request: Request, accepted: string[], message: string) => {
  const type = (request.headers.get("content-type") ?? "").toLowerCase();
  if (!accepted.some((a) => type.startsWith(a))) throw new AppError("unsupported_media_type", message);
};

export async function readJson(request: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  requireType(request, ["application/json"], "Send the body as application/json");
  const text = new TextDecoder().decode(await readBodyBytes(request, maxBytes));
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The body is not valid JSON");
  }
}

/** A text body (CSV) of one of the accepted types, within the byte limit. */
export async function readText(
  request: Request,
  accepted: string[],
  maxBytes: number,
  message: string,
): Promise<string> {
  requireType(request, accepted, message);
  return new TextDecoder().decode(await readBodyBytes(request, maxBytes));
}

/** A multipart/form-data body within the byte limit (files included). */
export async function readForm(request: Request, maxBytes: number, message: string): Promise<FormData> {
  requireType(request, ["multipart/form-data"], message);
  const bytes = await readBodyBytes(request, maxBytes);
  return new Response(new Blob([bytes as Uint8Array<ArrayBuffer>]), {
    headers: { "content-type": request.headers.get("content-type")! },
  })
    .formData()
    .catch(() => {
      throw new AppError("bad_request", "The upload could not be read");
    });
}

export interface Upload {
  name: string;
  data: Uint8Array;
}

/**
 * A file field of a form read by `readForm`: its name and bytes, or undefined when no file was chosen
 * (a browser then sends an empty part without a name). An empty file that has a name is returned,
 * for the caller to refuse as empty.
 */
export async function formFile(form: FormData, field: string): Promise<Upload | undefined> {
  const file = form.get(field);
  if (!(file instanceof File) || (file.size === 0 && !file.name)) return undefined;
  return { name: file.name, data: new Uint8Array(await file.arrayBuffer()) };
}

export function errorResponse(err: unknown): NextResponse {
  const known = toAppError(err);
  if (known) return NextResponse.json(known.toJSON(), { status: known.status });
  console.error(err);
  return NextResponse.json(
    { error: { code: "internal", message: "Something went wrong on the server" } },
    { status: 500 },
  );
}

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A state-changing request from another site's page carries the user's cookie but the browser
 * marks where it came from: refuse it (403). Requests without an Origin or Sec-Fetch-Site (scripts,
 * curl) are judged by their credentials alone.
 */
export function refuseCrossSite(request: Request, publicOrigin: string): void {
  if (SAFE_METHODS.has(request.method)) return;
  const site = request.headers.get("sec-fetch-site");
  if (site === "cross-site" || site === "same-site")
    throw new AppError("forbidden", "Requests from another site are refused");
  const origin = request.headers.get("origin");
  if (origin && origin !== "null" && origin !== publicOrigin)
    throw new AppError("forbidden", "Requests from another site are refused");
  if (origin === "null") throw new AppError("forbidden", "Requests from another site are refused");
}

const handling = new AsyncLocalStorage<Request>();

/** The request a route handler is answering (for its credentials), or undefined outside one. */
export const currentRequest = (): Request | undefined => handling.getStore();

/**
 * Wraps a route handler so that cross-site writes are refused, every thrown error becomes a JSON
 * error response, and `requireApiActor` can read the request's own credentials (a bearer token).
 */
export function handler<Args extends unknown[]>(fn: (...args: Args) => Promise<Response>) {
  return async (...args: Args): Promise<Response> => {
    const request = args[0];
    try {
      if (!(request instanceof Request)) return await fn(...args);
      // A bearer token is not sent by a browser on its own: cross-site rules are for cookies.
      if (!request.headers.get("authorization")?.startsWith("Bearer "))
        refuseCrossSite(request, new URL(config().NEXTAUTH_URL).origin);
      return await handling.run(request, () => fn(...args));
    } catch (err) {
      return errorResponse(err);
    }
  };
}
