"use client";

import { usePhone } from "./use-phone";

/**
 * On every page a foreman opens: what waits on the phone is sent, and the kept briefings are brought
 * up to date, whenever Heftwise is reachable — not only on the briefing screens.
 */
export function PhoneSync({ userId }: { userId: string }) {
  usePhone(userId);
  return null;
}
