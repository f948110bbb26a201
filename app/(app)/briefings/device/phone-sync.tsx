"use client";

import { useEffect } from "react";
import { bringCopiesUpToDate } from "./copies";
import { sendWaiting } from "./send";
import { probe } from "./store";

/** How often waiting records are tried again while Heftwise is open (Heftwise policy). */
const RETRY_MS = 5_000;

/**
 * On every page a foreman opens (the app layout), once: what waits on the phone is sent and the kept
 * briefings are brought up to date whenever Heftwise is reachable — now, when the signal returns,
 * and every few seconds while anything waits.
 */
export function PhoneSync({ userId }: { userId: string }) {
  useEffect(() => {
    const work = async ({ force = false } = {}) => {
      if (!navigator.onLine || !(await probe())) return;
      void sendWaiting(userId);
      void bringCopiesUpToDate(userId, { force });
    };
    // Back in signal: what changed while the phone was away matters now.
    const connectivity = () => void work({ force: navigator.onLine });
    void work();
    window.addEventListener("online", connectivity);
    window.addEventListener("offline", connectivity);
    const timer = setInterval(() => {
      if (navigator.onLine) void sendWaiting(userId);
    }, RETRY_MS);
    return () => {
      window.removeEventListener("online", connectivity);
      window.removeEventListener("offline", connectivity);
      clearInterval(timer);
    };
  }, [userId]);
  return null;
}
