/**
 * The pack PDF read back by independent tools: poppler's pdftotext and pdffonts (installed by
 * .ci/run), pdftoppm to render the cover, and jsQR to read its QR code as a phone would.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import jsQR from "jsqr";
import { PDFDocument } from "pdf-lib";
import { PNG } from "pngjs";
import { beforeAll, describe, expect, it } from "vitest";
import { buildBriefingSheet } from "@/assessments/pack/briefing-sheet";
import { buildPack, PACK_CAUTION } from "@/assessments/pack/document";
import type { PackFonts } from "@/assessments/pack/fonts";
import { Writer } from "@/assessments/pack/layout";
import { packFonts } from "@/assessments/pack/render";
import { savePack } from "@/assessments/pack/sign";
import { encodePng } from "@/lib/png";
import { packInput } from "./fixture";

let fonts: PackFonts;
beforeAll(async () => {
  fonts = await packFonts();
});

const dir = mkdtempSync(path.join(tmpdir(), "heftwise-pack-test-"));
function write(name: string, pdf: Uint8Array) {
  const file = path.join(dir, name);
  writeFileSync(file, pdf);
  return file;
}
const text = (file: string, ...args: string[]) => execFileSync("pdftotext", [...args, file, "-"], { encoding: "utf8" });
const flat = (s: string) => s.replace(/\s+/g, " ");

describe("the pack PDF", () => {
  it("carries every task, the caution on every page, and text with PDF-special characters intact", async () => {
    const title = "Re-lay cable route (section 2) \\ troughing: 40° bend, Ynys-ŵen approach";
    const pdf = await savePack(await buildPack(packInput(6, { title }), fonts));
    const file = write("tasks.pdf", pdf);
    const pages = (await PDFDocument.load(pdf)).getPageCount();
    const all = flat(text(file));
    // Parentheses and the backslash are escaped in the content stream; a character outside the
    // fonts (ŵ) is written as "?", never dropped silently.
    expect(all).toContain("Re-lay cable route (section 2) \\ troughing: 40° bend, Ynys-?en approach");
    for (let task = 1; task <= 6; task++) expect(all).toContain(`Task ${task}:`);
    for (let page = 1; page <= pages; page++) {
      const onPage = flat(text(file, "-f", String(page), "-l", String(page)));
      expect(onPage).toContain(flat(`Caution: ${PACK_CAUTION}`));
      expect(onPage).toContain(`page ${page} of ${pages}`);
    }
  });

  it("embeds the three shipped fonts whole, with a Unicode map so its text can be searched and copied", async () => {
    const file = write("fonts.pdf", await savePack(await buildPack(packInput(2), fonts)));
    const report = execFileSync("pdffonts", [file], { encoding: "utf8" });
    for (const name of ["AtkinsonHyperlegible-Regular", "AtkinsonHyperlegible-Bold", "AtkinsonHyperlegible-Italic"]) {
      const row = report.split("\n").find((line) => line.startsWith(name));
      // name, type, encoding, then emb / sub / uni
      expect(row?.split(/\s+/).slice(-5, -2)).toEqual(["yes", "no", "yes"]);
    }
  });

  it("prints a QR code on the cover that reads back as the verify address", async () => {
    const verifyUrl = "https://heftwise.brackenfold.example/verify";
    const file = write("qr.pdf", await savePack(await buildPack(packInput(1, { verifyUrl }), fonts)));
    execFileSync("pdftoppm", ["-png", "-r", "110", "-f", "1", "-l", "1", "-singlefile", file, path.join(dir, "cover")]);
    const { width, height, data } = PNG.sync.read(readFileSync(path.join(dir, "cover.png")));
    expect(jsQR(new Uint8ClampedArray(data.buffer, data.byteOffset, data.byteLength), width, height)?.data).toBe(
      verifyUrl,
    );
  });

  it("wraps a word wider than the column (a content hash) instead of running off the page", async () => {
    const w = new Writer(await PDFDocument.create(), fonts);
    const hash = "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855";
    const lines = w.lines(`hash ${hash} end`, fonts.regular, 10, 200);
    expect(lines.join("").replace(/ /g, "")).toBe(`hash${hash}end`);
    expect(lines.length).toBeGreaterThan(2);
    for (const line of lines) expect(fonts.regular.widthOfTextAtSize(line, 10)).toBeLessThanOrEqual(200);
  });

  it("draws signature images whatever their PNG flavour: transparent, opaque, grey, 16-bit", async () => {
    const stroke = (w: number, h: number, alpha: number) => {
      const rgba = new Uint8Array(w * h * 4);
      for (let x = 0; x < w; x++) {
        const y = Math.round(h / 2 + Math.sin(x / 8) * (h / 4));
        rgba.set([20, 40, 30, alpha], (y * w + x) * 4);
      }
      return rgba;
    };
    const transparent = encodePng(120, 40, stroke(120, 40, 255));
    const opaqueRgba = stroke(120, 40, 255).map((v, i) => (i % 4 === 3 ? 255 : v));
    const opaque = encodePng(120, 40, opaqueRgba);
    const grey = PNG.sync.write(PNG.sync.read(opaque), { colorType: 0, inputHasAlpha: true });
    const wide = Buffer.from(Uint16Array.from(stroke(120, 40, 255), (v) => v * 257).buffer);
    const sixteen = PNG.sync.write(Object.assign(new PNG({ width: 120, height: 40 }), { data: wide }), {
      bitDepth: 16,
    });
    expect([grey[25], sixteen[24]]).toEqual([0, 16]); // colour type grey; bit depth 16
    const signatures = [transparent, opaque, grey, sixteen].map((png, i) => ({
      name: `Signer ${i + 1}`,
      role: "Approver",
      signedAt: new Date("2027-01-11T14:05:00Z"),
      png,
    }));
    const pdf = await savePack(await buildPack(packInput(1, { signatures }), fonts));
    const all = flat(text(write("signatures.pdf", pdf)));
    for (let i = 1; i <= 4; i++) expect(all).toContain(`Signer ${i}, Approver`);
    const images = execFileSync("pdfimages", ["-list", path.join(dir, "signatures.pdf")], { encoding: "utf8" });
    // Four images; the two with transparency carry a soft mask, the opaque and grey ones none.
    const types = images
      .split("\n")
      .slice(2)
      .filter(Boolean)
      .map((line) => line.trim().split(/\s+/)[2]);
    expect(types).toEqual(["image", "smask", "image", "image", "image", "smask"]);
  });

  it("prints the lineside method statement: protection from trains, permits, buried services, the excavation, environment and welfare", async () => {
    const base = packInput(2);
    const content = structuredClone(base.content);
    Object.assign(content.lineside, {
      nearLine: "near",
      protection: "possession",
      responsibleName: "Nerys Caldwell",
      responsibleCompetence: "SSOW-PL 3318",
      positionsOfSafety: "Behind the fence at the base",
    });
    content.permits = [
      {
        kind: "dig",
        description: "",
        reference: "PTD-HV-0142",
        issuedBy: "Permit office",
        validFrom: "2027-01-04",
        validTo: "2027-02-28",
      },
    ];
    Object.assign(content.buriedServices, {
      recordsObtained: true,
      scanned: true,
      scannedBy: "Kieran Lusk",
      scanDate: "2027-01-02",
      rule: "Hand tools only within 0.5 m",
    });
    Object.assign(content.excavation, {
      present: true,
      depthM: 1.2,
      support: "trench-box",
      inspection: "Supervisor, before each shift",
    });
    content.environment.welfare = "Welfare van at the access point";
    const all = flat(text(write("lineside.pdf", await savePack(await buildPack({ ...base, content }, fonts)))));
    for (const expected of [
      "Working near the line",
      "Possession: the line handed over for engineering work",
      "Nerys Caldwell, SSOW-PL 3318",
      "Positions of safety",
      "Behind the fence at the base",
      "PTD-HV-0142",
      "04-01-2027 to 28-02-2027",
      "by Kieran Lusk on 02-01-2027",
      "Trench box or drag box",
      "Welfare van at the access point",
      "it does not plan protection from trains",
    ])
      expect(all).toContain(expected);
  });

  it("the briefing sheet uses the same fonts and layout", async () => {
    const pdf = await buildBriefingSheet(
      {
        title: "Equipment base by hand (east side)",
        jobName: "Hollin Vale loop",
        revisionNumber: 2,
        script: {
          line: {
            where: "Near the line",
            protection: "Separated from the line by a fence or barrier",
            protectionDetail: "Fence along the cess edge",
            responsible: "Nerys Caldwell (SSOW-PL 3318)",
            accessPoint: "Gorsey Lane gate",
            walkingRoute: "",
            positionsOfSafety: "Behind the fence",
            limits: "",
            permits: [{ name: "Permit to dig", reference: "PTD-HV-0142", issuedBy: "Permit office", valid: "" }],
            digging: [],
          },
          sequence: ["Set out the base"],
          loads: [],
          hazards: [{ hazard: "Trapped fingers", controls: ["Use the bar"] }],
          ppe: ["Gloves"],
          emergency: { nearestHospital: "Carrowby General", arrangements: "First aider: site lead" },
        },
        siteChanges: [],
      },
      fonts,
    );
    const all = flat(text(write("sheet.pdf", pdf)));
    expect(all).toContain("Briefing: Equipment base by hand (east side)");
    // Protection from trains, the positions of safety and the permits come before anything else.
    expect(all.indexOf("Safe from trains")).toBeGreaterThan(-1);
    expect(all.indexOf("Safe from trains")).toBeLessThan(all.indexOf("Sequence of work"));
    expect(all).toContain("Positions of safety: Behind the fence");
    expect(all).toContain("Permit to dig: PTD-HV-0142");
    expect(all).toContain("Nearest hospital (A&E): Carrowby General");
    expect(all).toContain("Caution:");
  });

  it("prints the organisation's logo on the cover, and a signing record from the trail", async () => {
    const logo = encodePng(160, 40, new Uint8Array(160 * 40 * 4).fill(200));
    const signingRecord = [
      {
        seq: 41,
        hash: "ab12cd34ef56".padEnd(64, "0"),
        event: "Approved and countersigned",
        who: "Ruth Okonjo-Vale",
        at: new Date("2027-01-11T14:05:00Z"),
        contentHash: "9f8e7d6c5b4a".padEnd(64, "1"),
        how: "re-confirmed at signing: password + authenticator; from 10.20.0.9",
      },
    ];
    const withLogo = write(
      "logo.pdf",
      await savePack(await buildPack(packInput(1, { logo: { data: logo, type: "image/png" }, signingRecord }), fonts)),
    );
    const without = write("no-logo.pdf", await savePack(await buildPack(packInput(1), fonts)));
    const cover = (file: string) =>
      execFileSync("pdfimages", ["-list", "-f", "1", "-l", "1", file], { encoding: "utf8" })
        .split("\n")
        .slice(2)
        .filter(Boolean)
        .map((line) => line.trim().split(/\s+/).slice(3, 5).join("x"));
    expect(cover(withLogo)).toContain("160x40");
    expect(cover(without)).not.toContain("160x40");
    const all = flat(text(withLogo));
    expect(all).toContain("Signing record");
    expect(all).toContain("ab12cd34ef56");
    expect(all).toMatch(/re-confirmed at signing: password \+ .*authenticator; from 10\.20\.0\.9/);
    expect(flat(text(without))).not.toContain("Signing record");
  });
});
