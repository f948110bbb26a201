/// <reference lib="webworker" />
/**
 * Heftwise's service worker (served by app/serwist/[path]/route.ts). It precaches the build's scripts,
 * styles and fonts, and keeps a foreman's briefing pages and sheets (lib/device-copies.ts): fetched
 * from the network while there is signal, updating the copy, and from the copy within seconds when there
 * is none. Any other page without signal gets the offline page; API writes are never answered from a
 * copy (the briefing page queues them on the phone instead).
 */
import { CacheableResponsePlugin, NetworkFirst, NetworkOnly, Serwist, type PrecacheEntry } from "serwist";
import { DEVICE_COPIES_CACHE, OFFLINE_PAGE, isKeptPage, isKeptSheet } from "@/lib/device-copies";

declare const self: ServiceWorkerGlobalScope & { __SW_MANIFEST: (PrecacheEntry | string)[] | undefined };

const fromCopyWhenNoSignal = new NetworkFirst({
  cacheName: DEVICE_COPIES_CACHE,
  // A weak signal at an access point: give up on the network after a few seconds and use the copy.
  networkTimeoutSeconds: 6,
  // Only a page actually served (not a redirect to sign-in, not an error) replaces the copy.
  plugins: [new CacheableResponsePlugin({ statuses: [200] })],
  matchOptions: { ignoreVary: true },
});

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.mode === "navigate" && isKeptPage(url.pathname),
      handler: fromCopyWhenNoSignal,
    },
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && isKeptSheet(url),
      handler: fromCopyWhenNoSignal,
    },
    {
      matcher: ({ request, sameOrigin }) => sameOrigin && request.mode === "navigate",
      handler: new NetworkOnly(),
    },
  ],
});

// No signal and no copy: a page the phone does not keep opens the list of briefings it does keep, or
// else the offline page explaining what works without signal.
serwist.setCatchHandler(async ({ request }) => {
  if (request.mode !== "navigate") return Response.error();
  const copies = await caches.open(DEVICE_COPIES_CACHE);
  return (
    (await copies.match("/briefings", { ignoreVary: true })) ??
    (await serwist.matchPrecache(OFFLINE_PAGE)) ??
    Response.error()
  );
});

serwist.addEventListeners();
