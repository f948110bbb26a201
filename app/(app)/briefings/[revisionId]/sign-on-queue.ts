/**
 * Sign-ons wait on the device until the server has them. Each has a key made on the device, so
 * sending it again after a lost connection cannot record it twice.
 */
import { ApiError, apiRequest, problemOf } from "@/lib/api-client";

export interface PendingSignOn {
  key: string;
  name: string;
  employer: string;
  cardNumber: string;
  signature: string;
  signedAt: string;
  state: "waiting" | "sent" | "refused";
  problem?: string;
}

const storageKey = (briefingId: string) => `heftwise-sign-ons-${briefingId}`;

export function loadQueue(briefingId: string): PendingSignOn[] {
  try {
    return JSON.parse(localStorage.getItem(storageKey(briefingId)) ?? "[]");
  } catch {
    return [];
  }
}

export function saveQueue(briefingId: string, queue: PendingSignOn[]) {
  localStorage.setItem(storageKey(briefingId), JSON.stringify(queue));
}

/** A random key, also where crypto.randomUUID is missing (plain http on a site network). */
export function newKey(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("");
}

/** Sends what is waiting, one at a time; stops at the first network failure (still offline). */
export async function flush(briefingId: string, queue: PendingSignOn[]): Promise<PendingSignOn[]> {
  const next = [...queue];
  for (let i = 0; i < next.length; i++) {
    const item = next[i];
    if (item.state !== "waiting") continue;
    try {
      await apiRequest(`/api/v1/briefings/${briefingId}/attendees`, {
        json: {
          key: item.key,
          name: item.name,
          employer: item.employer,
          cardNumber: item.cardNumber,
          signature: item.signature,
          signedAt: item.signedAt,
        },
      });
      next[i] = { ...item, state: "sent" };
    } catch (err) {
      // Still offline, or the server could not take it now: keep it waiting, in order.
      if (!(err instanceof ApiError) || err.retryable) break;
      next[i] = { ...item, state: "refused", problem: problemOf(err) };
    }
    saveQueue(briefingId, next);
  }
  return next;
}
