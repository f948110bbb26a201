"use client";

import { SerwistProvider } from "@serwist/turbopack/react";

/**
 * Registers the service worker (app/sw.ts) so that the app installs and a foreman's briefings open
 * without signal. It never reloads the page when the signal returns: a briefing may be under way.
 */
export function ServiceWorker({ children }: { children: React.ReactNode }) {
  return (
    <SerwistProvider
      swUrl="/serwist/sw.js"
      disable={process.env.NODE_ENV !== "production"}
      cacheOnNavigation={false}
      reloadOnOnline={false}
    >
      {children}
    </SerwistProvider>
  );
}
