/**
 * `npm run bench:pack`: time to build and sign the pack of a 30-task assessment with pdf-lib, and
 * the same content printed to PDF by headless Chromium (the usual HTML-to-PDF route), side by side.
 * Targets: the pack in at most 300 ms, and at least 10 times faster than Chromium.
 */
import { chromium } from "@playwright/test";
import QRCode from "qrcode";
import { buildPack } from "@/assessments/pack/document";
import { packFonts } from "@/assessments/pack/render";
import { savePack } from "@/assessments/pack/sign";
import { makeP12 } from "@/lib/signing-keys";
import { packInput } from "../pack/fixture";
import { packHtml } from "./pack-html";

async function main() {
  const fonts = await packFonts();
  const input = packInput(30);
  const { content } = input;
  const key = makeP12("Brackenfold Lineside Ltd", "bench-passphrase");
  const signing = {
    p12: key.p12,
    passphrase: "bench-passphrase",
    signerName: "Brackenfold Lineside Ltd",
    location: "Hollin Vale",
  };

  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const time = async (fn: () => Promise<unknown>) => {
    const start = performance.now();
    await fn();
    return performance.now() - start;
  };

  let bytes = 0;
  // Warm up, as a running server is: the first pack of a process also prepares the fonts' PDF
  // objects, and the next few run before the JavaScript engine has optimised the layout code.
  for (let i = 0; i < 10; i++) await savePack(await buildPack(input, fonts), signing);
  const packTimes: number[] = [];
  for (let i = 0; i < 25; i++)
    packTimes.push(
      await time(async () => (bytes = (await savePack(await buildPack(input, fonts), signing)).byteLength)),
    );

  const launchOptions = {
    executablePath: "/usr/bin/chromium",
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  };
  const qrPng = await QRCode.toBuffer(input.verifyUrl, { type: "png", margin: 1, width: 220 });
  const html = packHtml(input, { regular: fonts.regular.ttf, bold: fonts.bold.ttf }, qrPng);
  const printWith = async (page: import("@playwright/test").Page) => {
    await page.setContent(html, { waitUntil: "load" });
    await page.pdf({ format: "A4", printBackground: true });
  };

  // Chromium already running (a server keeps one browser): a fresh page per document.
  const browser = await chromium.launch(launchOptions);
  await printWith(await browser.newPage()); // warm up
  const warmTimes: number[] = [];
  for (let i = 0; i < 7; i++) {
    warmTimes.push(
      await time(async () => {
        const page = await browser.newPage();
        await printWith(page);
        await page.close();
      }),
    );
  }
  await browser.close();
  // Chromium launched for the document, as simple set-ups do.
  const coldTimes: number[] = [];
  for (let i = 0; i < 3; i++)
    coldTimes.push(
      await time(async () => {
        const b = await chromium.launch(launchOptions);
        await printWith(await b.newPage());
        await b.close();
      }),
    );

  const ours = median(packTimes);
  const warm = median(warmTimes);
  const cold = median(coldTimes);
  console.log(
    `Pack of ${content.tasks.length} tasks, the same content both ways (fonts, QR code, signature, sling drawings)`,
  );
  console.log(
    `  Heftwise: pdf-lib build + PKCS#7 sign     median ${ours.toFixed(0).padStart(5)} ms  (${bytes.toLocaleString("en-GB")} bytes)   target ≤ 300 ms: ${ours <= 300 ? "met" : "MISSED"}`,
  );
  console.log(
    `  Chromium running, new page → PDF (unsigned) median ${warm.toFixed(0).padStart(5)} ms   Heftwise ${(warm / ours).toFixed(1)}× faster   target ≥ 10×: ${warm / ours >= 10 ? "met" : "MISSED"}`,
  );
  console.log(
    `  Chromium launched per document (unsigned)   median ${cold.toFixed(0).padStart(5)} ms   Heftwise ${(cold / ours).toFixed(1)}× faster   target ≥ 10×: ${cold / ours >= 10 ? "met" : "MISSED"}`,
  );
  const ratio = warm / ours;
  process.exitCode = ours <= 300 && ratio >= 10 ? 0 : 1;
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
