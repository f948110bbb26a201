import { createSerwistRoute } from "@serwist/turbopack";
import fs from "node:fs";
import path from "node:path";

/**
 * The pages a foreman's phone opens without signal (lib/device-copies.ts), by their build files: the
 * scripts and styles they load are precached; the rest of the build (the API reference's large
 * viewer, the adviser's editors) is fetched when used, so installing costs a phone little data.
 */
const OFFLINE_PAGES = ["(app)/page", "(app)/briefings/page", "(app)/briefings/[revisionId]/page"];

function filesOfOfflinePages(): Set<string> | null {
  const files = new Set<string>();
  for (const page of OFFLINE_PAGES)
    for (const manifest of [`${page}_client-reference-manifest.js`, `${page}/build-manifest.json`]) {
      const file = path.join(".next/server/app", manifest);
      if (!fs.existsSync(file)) return null;
      for (const [chunk] of fs.readFileSync(file, "utf8").matchAll(/static\/chunks\/[\w.-]+\.(?:js|css)/g))
        files.add(chunk);
    }
  return files;
}

/** Serves the service worker (app/sw.ts), bundled at build time with the list of files to precache. */
export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "app/sw.ts",
  useNativeEsbuild: true,
  globPatterns: [".next/static/**/*.{js,css,woff,woff2,svg}", "public/**/*"],
  manifestTransforms: [
    (entries) => {
      const needed = filesOfOfflinePages();
      // Build files not where expected: precache the whole build rather than miss a page's script.
      if (!needed) return { manifest: entries, warnings: ["Offline pages' build files not found: precaching all"] };
      const chunk = (url: string) => url.match(/static\/chunks\/[\w.-]+\.(?:js|css)$/)?.[0];
      return { manifest: entries.filter((e) => !chunk(e.url) || needed.has(chunk(e.url)!)), warnings: [] };
    },
  ],
});
