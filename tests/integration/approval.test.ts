/**
 * Approval: submit → the approver is e-mailed with the draft pack; countersign → locked, signed pack
 * (checked with node-forge's ASN.1 parser and with poppler's pdfsig where present), superseding;
 * a tampered pack is reported altered; return → the author is e-mailed and can edit again.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import forge from "node-forge";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  approveRevision,
  getPackFile,
  getReview,
  returnRevision,
  startNewRevision,
  submitRevision,
  verifyPack,
} from "@/assessments/revisions/approval";
import { getRevision, saveRevision } from "@/assessments/revisions/service";
import { listAssessments } from "@/assessments/revisions/queries";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import { AppError } from "@/lib/errors";
import { startMailFake, type MailFake } from "@/lib/mail/fake-server";
import { drawnSignaturePng, encodePng } from "@/lib/png";
import type { Actor } from "@/lib/permissions";
import { actorFor, completeLineside, demoOrganisation, reviewDateIn } from "./helpers";

let fake: MailFake;
let adviser: Actor;
let approver: Actor;
let foreman: Actor;

const SIGNATURE = `data:image/png;base64,${drawnSignaturePng(1).toString("base64")}`;

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
  const { organisationId } = await demoOrganisation();
  adviser = await actorFor("adviser", organisationId);
  approver = await actorFor("approver", organisationId);
  foreman = await actorFor("foreman", organisationId);
});
afterAll(() => fake.close());

const code = (p: Promise<unknown>) =>
  p.then(
    () => "ok",
    (e) => (e instanceof AppError ? e.code : String(e)),
  );
const craneRevision = async () =>
  (await listAssessments(adviser)).find((a) => a.title.includes("lorry-loader"))!.revisionId;

/**
 * Length of the DER value at the start of `bytes`, header included. The /Contents hole is padded with
 * zeros after the signature; its own length header says where it ends (trimming trailing zeros would
 * also cut a signature whose last byte happens to be 00).
 */
function derLength(bytes: Buffer) {
  const first = bytes[1];
  if (first < 0x80) return 2 + first;
  const size = first & 0x7f;
  return 2 + size + bytes.subarray(2, 2 + size).reduce((n, b) => n * 256 + b, 0);
}

/** Checks the CMS signature in a signed PDF independently of the signing code. */
function checkPdfSignature(pdf: Buffer) {
  const text = pdf.toString("latin1");
  const byteRange = text
    .match(/\/ByteRange\s*\[\s*(\d+)\s+(\d+)\s+(\d+)\s+(\d+)\s*\]/)!
    .slice(1)
    .map(Number);
  const signedBytes = Buffer.concat([
    pdf.subarray(byteRange[0], byteRange[0] + byteRange[1]),
    pdf.subarray(byteRange[2], byteRange[2] + byteRange[3]),
  ]);
  const contents = Buffer.from(
    pdf.subarray(byteRange[0] + byteRange[1] + 1, byteRange[2] - 1).toString("latin1"),
    "hex",
  );
  const p7 = forge.pkcs7.messageFromAsn1(
    forge.asn1.fromDer(contents.subarray(0, derLength(contents)).toString("binary")),
  ) as forge.pkcs7.PkcsSignedData & { rawCapture: { authenticatedAttributes: forge.asn1.Asn1[]; signature: string } };
  const cert = p7.certificates[0];
  const attrs = p7.rawCapture.authenticatedAttributes;
  const digestAttr = attrs.find(
    (a) => forge.asn1.derToOid((a.value as forge.asn1.Asn1[])[0].value as string) === forge.pki.oids.messageDigest,
  )!;
  const messageDigest = ((digestAttr.value as forge.asn1.Asn1[])[1].value as forge.asn1.Asn1[])[0].value as string;
  const contentDigest = createHash("sha256").update(signedBytes).digest("binary");
  const set = forge.asn1.create(forge.asn1.Class.UNIVERSAL, forge.asn1.Type.SET, true, attrs);
  const attrsDigest = forge.md.sha256.create().update(forge.asn1.toDer(set).getBytes()).digest().getBytes();
  const signatureOk = (cert.publicKey as forge.pki.rsa.PublicKey).verify(attrsDigest, p7.rawCapture.signature);
  return {
    digestMatches: messageDigest === contentDigest,
    signatureOk,
    coversAllButSignature: byteRange[0] === 0 && byteRange[2] + byteRange[3] === pdf.length,
    subject: cert.subject.getField("O").value as string,
  };
}

describe("submit and countersign", () => {
  it("submission e-mails the named approver a link and the draft pack", async () => {
    const id = await craneRevision();
    const current = await getRevision(adviser, id);
    const { mail } = await submitRevision(adviser, id, {
      version: current.revision.version,
      approverId: approver.id,
      reviewDate: reviewDateIn(210),
    });
    expect(mail!.status).toBe("sent");
    const message = fake.messages.find((m) => m.to.includes(approver.email))!;
    expect(message.subject).toContain("Review requested");
    expect(message.text).toContain(`/reviews/${id}`);
    // Dates in e-mails read day-month-year, as on site.
    const [y, m, d] = reviewDateIn(210).split("-");
    expect(message.text.replace(/\s+/g, " ")).toContain(`The proposed review date is ${d}-${m}-${y}.`);
    expect(message.attachments).toEqual([expect.objectContaining({ contentType: "application/pdf" })]);
    expect(message.attachments[0].size).toBeGreaterThan(5000);
    // Read-only for its author now.
    expect(
      await code(saveRevision(adviser, id, { version: current.revision.version + 1, content: current.content })),
    ).toBe("conflict");
  });

  it("only the named approver reviews; a bad signature is refused and nothing changes", async () => {
    const id = await craneRevision();
    expect(await code(getReview(adviser, id))).toBe("forbidden");
    const { revision } = await getReview(approver, id);
    const noName = await approveRevision(approver, id, {
      version: revision.version,
      name: "",
      role: "Contracts manager",
      contentHash: revision.contentHash!,
      password: DEMO_PASSWORD,
      signature: "no image",
    }).catch((e: AppError) => e);
    expect((noName as AppError).issues!.map((i) => i.path).sort()).toEqual(["name", "signature"]);
    const notPng = await approveRevision(approver, id, {
      version: revision.version,
      name: "Ruth",
      role: "Contracts manager",
      contentHash: revision.contentHash!,
      password: DEMO_PASSWORD,
      signature: "data:image/png;base64,AAAA",
    }).catch((e: AppError) => e);
    expect((notPng as AppError).issues!.map((i) => i.path)).toEqual(["signature"]);
    // A real PNG header over damaged data, a blank (fully transparent) drawing, and a header that
    // claims an enormous image: each refused on the field before anything is written.
    const good = drawnSignaturePng(3);
    const damaged = Buffer.concat([good.subarray(0, 40), Buffer.alloc(200, 7)]);
    const blank = encodePng(240, 80, new Uint8Array(240 * 80 * 4));
    const huge = Buffer.from(good);
    huge.writeUInt32BE(100_000, 16);
    for (const png of [damaged, blank, huge]) {
      const refused = await approveRevision(approver, id, {
        version: revision.version,
        name: "Ruth",
        role: "Contracts manager",
        contentHash: revision.contentHash!,
        password: DEMO_PASSWORD,
        signature: `data:image/png;base64,${png.toString("base64")}`,
      }).catch((e: AppError) => e);
      expect((refused as AppError).issues).toEqual([{ path: "signature", message: "Draw your signature" }]);
    }
    expect((await getReview(approver, id)).revision.status).toBe("submitted");
  });

  it("countersigning locks the revision, signs the pack validly, and e-mails the author", async () => {
    const id = await craneRevision();
    const { revision } = await getReview(approver, id);
    const { mail } = await approveRevision(approver, id, {
      version: revision.version,
      name: "Ruth Okonjo-Vale",
      role: "Contracts manager",
      contentHash: revision.contentHash!,
      password: DEMO_PASSWORD,
      signature: SIGNATURE,
    });
    expect(mail!.status).toBe("sent");
    expect(fake.messages.some((m) => m.to.includes(adviser.email) && m.subject.startsWith("Approved"))).toBe(true);

    const after = await getRevision(adviser, id);
    expect(after.revision.status).toBe("approved");
    expect(await code(saveRevision(adviser, id, { version: after.revision.version, content: after.content }))).toBe(
      "conflict",
    );
    expect(
      await code(
        approveRevision(approver, id, {
          version: after.revision.version,
          name: "Ruth Okonjo-Vale",
          role: "Contracts manager",
          contentHash: after.revision.contentHash!,
          password: DEMO_PASSWORD,
          signature: SIGNATURE,
        }),
      ),
    ).toBe("conflict");

    const pack = await getPackFile(adviser, id);
    const pdf = Buffer.from(pack.data);
    const check = checkPdfSignature(pdf);
    expect(check).toEqual({
      digestMatches: true,
      signatureOk: true,
      coversAllButSignature: true,
      subject: "Brackenfold Lineside Ltd",
    });
    expect(await getPackFile(foreman, id)).toBeTruthy();

    const dir = mkdtempSync(path.join(tmpdir(), "heftwise-pack-"));
    const file = path.join(dir, "pack.pdf");
    writeFileSync(file, pdf);
    if (spawnSync("which", ["pdfsig"]).status === 0) {
      const report = spawnSync("pdfsig", [file], { encoding: "utf8" }).stdout;
      expect(report).toContain("Signature is Valid");
    }
    if (spawnSync("which", ["pdftotext"]).status === 0) {
      const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
      expect(text).toContain("does not replace, the judgement of a competent person");
      expect(text).toMatch(/page 1 of \d+/);
      expect(text).toContain("Ruth Okonjo-Vale, Contracts manager");
    }

    expect(await verifyPack(pdf)).toMatchObject({
      result: "authentic",
      status: "approved",
      kind: "approved",
      revision: 1,
    });
    const tampered = Buffer.from(pdf);
    const at = tampered.indexOf("Hollin Vale");
    tampered[at] = "J".charCodeAt(0);
    expect(await verifyPack(tampered)).toMatchObject({ result: "altered", revision: 1 });
    expect(await verifyPack(Buffer.from("%PDF-1.4 nothing of ours"))).toEqual({ result: "unknown" });
  });

  it("a new revision starts as a draft copy; once approved, the old one is superseded", async () => {
    const first = await craneRevision();
    const { revisionId } = await startNewRevision(adviser, first);
    expect(await code(startNewRevision(adviser, first))).toBe("conflict");
    const draft = await getRevision(adviser, revisionId);
    expect(draft.revision.number).toBe(2);
    const { mail } = await submitRevision(adviser, revisionId, {
      version: draft.revision.version,
      approverId: approver.id,
      reviewDate: reviewDateIn(240),
    });
    expect(mail!.status).toBe("sent");
    const { revision } = await getReview(approver, revisionId);
    await approveRevision(approver, revisionId, {
      version: revision.version,
      name: "Ruth Okonjo-Vale",
      role: "Contracts manager",
      contentHash: revision.contentHash!,
      password: DEMO_PASSWORD,
      signature: SIGNATURE,
    });
    expect((await getRevision(adviser, first)).revision.status).toBe("superseded");
    const oldPack = await getPackFile(adviser, first);
    expect(await verifyPack(oldPack.data)).toMatchObject({ result: "authentic", status: "superseded", revision: 1 });
  });
});

describe("return with comments", () => {
  it("returns the revision to its author as a draft, e-mails them, and the draft can be edited again", async () => {
    const list = await listAssessments(adviser);
    const id = list.find((a) => a.title === "Equipment base by hand at Carrowby")!.revisionId;
    const current = await getRevision(adviser, id);
    // Make it submittable: the lineside sections, people, and no task at Stop.
    const content = completeLineside(current.content);
    content.people.roles = [{ role: "Person in charge", name: "Dafydd Strand", competence: "PTS 1234" }];
    content.tasks = content.tasks.filter((t) => t.operation !== "lift");
    const saved = await saveRevision(adviser, id, { version: current.revision.version, content });
    await submitRevision(adviser, id, {
      version: saved.version,
      approverId: approver.id,
      reviewDate: reviewDateIn(210),
    });
    const { revision } = await getReview(approver, id);
    expect(await code(returnRevision(approver, id, { version: revision.version, comments: { scope: "" } }))).toBe(
      "validation",
    );
    const { mail } = await returnRevision(approver, id, {
      version: revision.version,
      comments: { loads: "Show how the top frame is lifted at height.", scope: "" },
    });
    expect(mail!.status).toBe("sent");
    const message = fake.messages.filter((m) => m.to.includes(adviser.email)).at(-1)!;
    expect(message.subject).toMatch(/^Returned/);
    expect(message.text).toContain("Show how the top frame is lifted at height.");
    const back = await getRevision(adviser, id);
    expect(back.revision.status).toBe("draft");
    expect(back.revision.returnComments).toMatchObject({
      comments: { loads: "Show how the top frame is lifted at height." },
    });
    const edited = await saveRevision(adviser, id, { version: back.revision.version, content: back.content });
    expect(edited.version).toBe(back.revision.version + 1);
  });
});
