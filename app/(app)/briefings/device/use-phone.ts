"use client";

import { useEffect, useState } from "react";
import {
  briefingsOf,
  copiesOf,
  lastContact,
  onChange,
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

/**
 * The phone's records for this person, kept current on screen. The sending and the copies are the
 * work of `PhoneSync`, once for the whole app.
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
    const connectivity = () => setState((s) => ({ ...s, online: online() }));
    void read();
    const stop = onChange(() => void read());
    window.addEventListener("online", connectivity);
    window.addEventListener("offline", connectivity);
    return () => {
      alive = false;
      stop();
      window.removeEventListener("online", connectivity);
      window.removeEventListener("offline", connectivity);
    };
  }, [userId]);

  return state;
}
