"use client";

import { useEffect, useState } from "react";
import { bringCopiesUpToDate } from "./copies";
import { sendWaiting } from "./send";
import {
  briefingsOf,
  copiesOf,
  lastContact,
  onChange,
  probe,
  recordsOf,
  type CopiesState,
  type OutgoingRecord,
  type PhoneBriefing,
} from "./store";

export interface PhoneState {
  loaded: boolean;
  online: boolean;
  briefings: PhoneBriefing[];
  records: OutgoingRecord[];
  copies: CopiesState | undefined;
  /** When this state was read (ms): "now" for anything shown from it. */
  readAt: number;
}

/** Signal as far as the phone can tell: a network joined, and Heftwise answering at the last try. */
const online = () => navigator.onLine && lastContact() !== false;

/** How often waiting records are tried again while a screen is open (Heftwise policy). */
const RETRY_MS = 5_000;

/**
 * The phone's records for this person, kept current on screen, and the work that goes with having
 * signal: sending what waits and bringing the copies up to date, now, when the signal returns, and
 * every few seconds while anything waits.
 */
export function usePhone(userId: string): PhoneState {
  const [state, setState] = useState<PhoneState>({
    loaded: false,
    online: true,
    briefings: [],
    records: [],
    copies: undefined,
    readAt: 0,
  });

  useEffect(() => {
    let alive = true;
    const read = async () => {
      const [briefings, records, copies] = await Promise.all([
        briefingsOf(userId),
        recordsOf(userId),
        copiesOf(userId),
      ]);
      if (alive) setState({ loaded: true, online: online(), briefings, records, copies, readAt: Date.now() });
    };
    const work = async ({ force = false } = {}) => {
      if (!navigator.onLine || !(await probe())) return;
      void sendWaiting(userId);
      void bringCopiesUpToDate(userId, { force });
    };
    // Back in signal: what changed while the phone was away matters now.
    const connectivity = () => {
      setState((s) => ({ ...s, online: online() }));
      void work({ force: navigator.onLine });
    };
    void read();
    void work();
    const stop = onChange(() => void read());
    window.addEventListener("online", connectivity);
    window.addEventListener("offline", connectivity);
    const timer = setInterval(() => {
      if (navigator.onLine) void sendWaiting(userId);
    }, RETRY_MS);
    return () => {
      alive = false;
      stop();
      window.removeEventListener("online", connectivity);
      window.removeEventListener("offline", connectivity);
      clearInterval(timer);
    };
  }, [userId]);

  return state;
}
