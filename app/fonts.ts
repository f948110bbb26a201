import localFont from "next/font/local";

// Atkinson Hyperlegible: drawn for legibility, which matters outdoors, in poor light, on a phone.
// The same files in fonts/ are embedded in the PDF pack.
export const hyperlegible = localFont({
  src: [
    { path: "../fonts/atkinson-hyperlegible-latin-400-normal.woff", weight: "400", style: "normal" },
    { path: "../fonts/atkinson-hyperlegible-latin-400-italic.woff", weight: "400", style: "italic" },
    { path: "../fonts/atkinson-hyperlegible-latin-700-normal.woff", weight: "700", style: "normal" },
  ],
  variable: "--font-hyperlegible",
  display: "swap",
});
