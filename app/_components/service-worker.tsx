"use client";

import { SerwistProvider } from "@serwist/turbopack/react";
import { useEffect } from "react";

/**
 * Registers the service worker (app/sw.ts) so that the app installs and a foreman's briefings open
 * without signal. Registered once the page has loaded, so that its precaching never competes with the
 * page itself; it never reloads the page when the signal returns, since a briefing may be under way.
 */
export function ServiceWorker({ children }: { children: React.ReactNode }) {
  const enabled = process.env.NODE_ENV === "production";
  useEffect(() => {
    if (!enabled || !("serviceWorker" in navigator)) return;
    const register = () => void window.serwist?.register();
    if (document.readyState === "complete") register();
    else window.addEventListener("load", register, { once: true });
    return () => window.removeEventListener("load", register);
  }, [enabled]);
  return (
    <SerwistProvider
      swUrl="/serwist/sw.js"
      disable={!enabled}
      register={false}
      cacheOnNavigation={false}
      reloadOnOnline={false}
    >
      {children}
    </SerwistProvider>
  );
}
