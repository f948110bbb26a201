/** Helpers for pages (server components). */
import { notFound } from "next/navigation";
import { AppError, type ErrorCode } from "./errors";

/**
 * The record a domain call returns, or the 404 page when the domain answers "not found" — for this
 * caller, another organisation's record is not found either. `alsoNotFound` names other answers a
 * page shows as 404 (a review page for a revision that is not the caller's to review, say).
 */
export async function foundOr404<T>(promise: Promise<T>, alsoNotFound: ErrorCode[] = []): Promise<T> {
  try {
    return await promise;
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || alsoNotFound.includes(err.code))) notFound();
    throw err;
  }
}
