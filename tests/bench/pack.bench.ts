/**
 * `npm run bench:pack`: time to build and sign the pack of a 30-task assessment with pdf-lib, and
 * the same content printed to PDF by headless Chromium (the usual HTML-to-PDF route), side by side.
 * Targets: the pack in at most 300 ms, and at least 10 times faster than Chromium.
 */
import { chromium } from "@playwright/test";
import QRCode from "qrcode";
import { TEMPLATES } from "@/assessments/method-statement/templates";
import { reviewContent, type RegisterEntry } from "@/assessments/method-statement/score-task";
import { buildPack, type PackInput } from "@/assessments/pack/document";
import { packFonts } from "@/assessments/pack/render";
import { savePack } from "@/assessments/pack/sign";
import { DEMO_COMPONENTS, DEMO_LIFT_TEAM, DEMO_EXAMINATIONS } from "@/db/demo-scenario";
import { drawnSignaturePng } from "@/lib/png";
import { makeP12 } from "@/lib/signing-keys";
import { packHtml } from "./pack-html";

const register: RegisterEntry[] = DEMO_COMPONENTS.map((c, i) => ({ id: `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`, name: c.name, massKg: c.massKg, grip: c.grip, massSource: c.massSource }));
const byName = (name: string) => register.find((c) => c.name === name)?.id ?? null;

// 30 tasks: the three templates' tasks, repeated, with the lift team filled in.
const base = TEMPLATES.map((t) => t.build(byName));
const content = { ...base[2], tasks: [] as (typeof base)[number]["tasks"], hazards: base.flatMap((b) => b.hazards) };
for (let i = 0; content.tasks.length < 30; i++) {
  const task = structuredClone(base[i % 3].tasks[i % base[i % 3].tasks.length]);
  task.id = `t-${content.tasks.length + 1}`;
  if (task.lift) Object.assign(task.lift, { liftDate: "2027-01-20", people: DEMO_LIFT_TEAM, examinations: DEMO_EXAMINATIONS });
  content.tasks.push(task);
}
const review = reviewContent(content, register);

async function main() {
  const fonts = await packFonts();
  const input: PackInput = {
    organisation: "Brackenfold Lineside Ltd",
    title: "Benchmark: thirty handling tasks",
    job: { name: "Hollin Vale loop", client: "Wendmoor Railway Infrastructure", location: "Hollin Vale", lineReference: "WHV", mileage: "14m 22ch", accessPoint: "Gorsey Lane", siteContactName: "Tamsin Greyholt", siteContactPhone: "07700 900418" },
    revision: { id: "00000000-0000-4000-8000-00000000beef", number: 1, status: "approved", authorName: "Idris Pennock", approverName: "Ruth Okonjo-Vale", submittedAt: new Date(), approvedAt: new Date(), reviewDate: "2027-07-20", contentHash: "0".repeat(64) },
    content,
    scores: review.scores,
    componentNames: Object.fromEntries(register.map((c) => [c.id, c.name])),
    signatures: [{ name: "Ruth Okonjo-Vale", role: "Contracts manager", signedAt: new Date(), png: drawnSignaturePng(2) }],
    briefings: [],
    verifyUrl: "http://localhost:3000/verify",
    qrPng: new Uint8Array(await QRCode.toBuffer("http://localhost:3000/verify", { type: "png", margin: 1, width: 220 })),
  };
  const key = makeP12("Brackenfold Lineside Ltd", "bench-passphrase");
  const signing = { p12: key.p12, passphrase: "bench-passphrase", signerName: "Brackenfold Lineside Ltd", location: "Hollin Vale" };

  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const time = async (fn: () => Promise<unknown>) => {
    const start = performance.now();
    await fn();
    return performance.now() - start;
  };

  let bytes = 0;
  await savePack(await buildPack(input, fonts), signing); // warm up
  const packTimes: number[] = [];
  for (let i = 0; i < 9; i++) packTimes.push(await time(async () => (bytes = (await savePack(await buildPack(input, fonts), signing)).byteLength)));

  const launchOptions = { executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"] };
  const html = packHtml(input, fonts);
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
  console.log(`Pack of ${content.tasks.length} tasks, the same content both ways (fonts, QR code, signature, sling drawings)`);
  console.log(`  Heftwise: pdf-lib build + PKCS#7 sign     median ${ours.toFixed(0).padStart(5)} ms  (${bytes.toLocaleString("en-GB")} bytes)   target ≤ 300 ms: ${ours <= 300 ? "met" : "MISSED"}`);
  console.log(`  Chromium running, new page → PDF (unsigned) median ${warm.toFixed(0).padStart(5)} ms   Heftwise ${(warm / ours).toFixed(1)}× faster   target ≥ 10×: ${warm / ours >= 10 ? "met" : "MISSED"}`);
  console.log(`  Chromium launched per document (unsigned)   median ${cold.toFixed(0).padStart(5)} ms   Heftwise ${(cold / ours).toFixed(1)}× faster   target ≥ 10×: ${cold / ours >= 10 ? "met" : "MISSED"}`);
  const ratio = warm / ours;
  process.exitCode = ours <= 300 && ratio >= 10 ? 0 : 1;
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
