/**
 * What a foreman's phone keeps for use without signal, shared by the service worker (app/sw.ts) and the
 * page that brings the copies up to date: the start page, the list of briefings, each approved
 * revision's briefing page and its briefing sheet PDF. Nothing else is kept: other pages and every API
 * answer go to the network, so no one reads a stale assessment where signal is available.
 */

/** The Cache Storage cache holding the copies (cleared at sign-out). */
export const DEVICE_COPIES_CACHE = "heftwise-briefing-copies";

/** The page served for a page not kept on the phone, when there is no signal (precached from public/). */
export const OFFLINE_PAGE = "/offline.html";

const UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
const KEPT_PAGE = new RegExp(`^/(briefings(/${UUID})?)?$`, "i");
const SHEET = new RegExp(`^/api/v1/revisions/${UUID}/briefing-sheet$`, "i");

/** A page the phone keeps a copy of: `/`, `/briefings` or a revision's briefing page. */
export const isKeptPage = (pathname: string): boolean => KEPT_PAGE.test(pathname);

/** A revision's briefing sheet PDF (without a briefing's record, which changes as people sign on). */
export const isKeptSheet = (url: URL): boolean => SHEET.test(url.pathname) && url.search === "";
