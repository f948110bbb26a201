import type { MetadataRoute } from "next";

/**
 * The installable app: Heftwise's own name, colours and icons (public/icons). It opens on the start
 * page; a foreman's phone also keeps the briefings for use without signal (app/sw.ts).
 */
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: "/",
    name: "Heftwise",
    short_name: "Heftwise",
    description: "Briefings, sign-ons and risk assessments for lineside and civils work, with or without signal.",
    lang: "en-GB",
    dir: "ltr",
    start_url: "/",
    scope: "/",
    display: "standalone",
    orientation: "portrait",
    background_color: "#f6f4ee",
    theme_color: "#16302b",
    categories: ["business", "productivity"],
    icons: [
      { src: "/icons/heftwise-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/heftwise-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      { src: "/icons/heftwise-maskable-192.png", sizes: "192x192", type: "image/png", purpose: "maskable" },
      { src: "/icons/heftwise-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
    ],
  };
}
