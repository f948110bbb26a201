/**
 * Route handler plumbing: read a JSON body safely (type, size, syntax), and turn any AppError into
 * its status and `{"error": {...}}` body. Handlers stay thin: parse, authorize, call the domain.
 */
import { NextResponse } from "next/server";
import { AppError } from "./errors";

export const MAX_JSON_BYTES = 1_000_000;

export async function readJson(request: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("application/json"))
    throw new AppError("unsupported_media_type", "Send the body as application/json");
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new AppError("payload_too_large", `The body is larger than ${maxBytes} bytes`);
  const text = await request.text();
  if (Buffer.byteLength(text) > maxBytes) throw new AppError("payload_too_large", `The body is larger than ${maxBytes} bytes`);
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The body is not valid JSON");
  }
}

export function errorResponse(err: unknown): NextResponse {
  if (err instanceof AppError) return NextResponse.json(err.toJSON(), { status: err.status });
  console.error(err);
  return NextResponse.json({ error: { code: "internal", message: "Something went wrong on the server" } }, { status: 500 });
}

/** Wraps a route handler so that every thrown error becomes a JSON error response. */
export function handler<Args extends unknown[]>(fn: (...args: Args) => Promise<Response>) {
  return async (...args: Args): Promise<Response> => {
    try {
      return await fn(...args);
    } catch (err) {
      return errorResponse(err);
    }
  };
}
