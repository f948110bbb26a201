/**
 * Sign-ons wait on the device until the server has them. Each has a key made on the device, so
 * sending it again after a lost connection cannot record it twice.
 */
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
    let res: Response;
    try {
      res = await fetch(`/api/v1/briefings/${briefingId}/attendees`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ key: item.key, name: item.name, employer: item.employer, cardNumber: item.cardNumber, signature: item.signature, signedAt: item.signedAt }),
      });
    } catch {
      break;
    }
    if (res.ok) next[i] = { ...item, state: "sent" };
    else if (res.status >= 400 && res.status < 500 && res.status !== 408 && res.status !== 429) {
      const body = await res.json().catch(() => ({}));
      next[i] = { ...item, state: "refused", problem: body.error?.issues?.[0]?.message ?? body.error?.message ?? "Refused" };
    } else break;
    saveQueue(briefingId, next);
  }
  return next;
}
