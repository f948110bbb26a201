/**
 * Saves a pack, and for an approved revision signs it with a detached PKCS#7 (CMS) signature that
 * standard PDF readers and poppler's pdfsig check. One signature per file: pdf-lib's placeholder
 * helper does not support more.
 *
 * The signer is @signpdf's, with two changes for speed: the PKCS#12 is opened once per process
 * (opening it runs 2048 rounds of key derivation), and the RSA operation runs in Node's native
 * crypto instead of node-forge's JavaScript big numbers.
 */
import { createHash, createPrivateKey, privateEncrypt, constants } from "node:crypto";
import { pdflibAddPlaceholder } from "@signpdf/placeholder-pdf-lib";
import { SignPdf } from "@signpdf/signpdf";
import { Signer } from "@signpdf/utils";
import forge from "node-forge";
import type { PDFDocument } from "pdf-lib";

export interface SigningMaterial {
  p12: Uint8Array;
  passphrase: string;
  signerName: string;
  location: string;
}

interface OpenedKey {
  certificate: forge.pki.Certificate;
  sign: (md: forge.md.MessageDigest) => string;
}

// RSASSA-PKCS1-v1_5 over a SHA-256 digest: the DER prefix of DigestInfo { sha256, digest }.
const SHA256_DIGEST_INFO = Buffer.from("3031300d060960864801650304020105000420", "hex");
const opened = new Map<string, OpenedKey>();

function openP12(p12: Uint8Array, passphrase: string): OpenedKey {
  const cacheKey = createHash("sha256").update(p12).update(passphrase).digest("hex");
  let key = opened.get(cacheKey);
  if (!key) {
    const parsed = forge.pkcs12.pkcs12FromAsn1(
      forge.asn1.fromDer(Buffer.from(p12).toString("binary")),
      false,
      passphrase,
    );
    const certificate = parsed.getBags({ bagType: forge.pki.oids.certBag })[forge.pki.oids.certBag]![0].cert!;
    const forgeKey = parsed.getBags({ bagType: forge.pki.oids.pkcs8ShroudedKeyBag })[
      forge.pki.oids.pkcs8ShroudedKeyBag
    ]![0].key!;
    const nativeKey = createPrivateKey(forge.pki.privateKeyToPem(forgeKey));
    key = {
      certificate,
      sign: (md) => {
        const digest = Buffer.from(md.digest().getBytes(), "binary");
        return privateEncrypt(
          { key: nativeKey, padding: constants.RSA_PKCS1_PADDING },
          Buffer.concat([SHA256_DIGEST_INFO, digest]),
        ).toString("binary");
      },
    };
    opened.set(cacheKey, key);
  }
  return key;
}

/** A CMS signer for @signpdf: SHA-256, the attributes Adobe's adbe.pkcs7.detached expects. */
class PackSigner extends Signer {
  constructor(private readonly key: OpenedKey) {
    super();
  }

  async sign(pdfBuffer: Buffer, signingTime?: Date): Promise<Buffer> {
    const p7 = forge.pkcs7.createSignedData();
    p7.content = forge.util.createBuffer(pdfBuffer.toString("binary"));
    p7.addCertificate(this.key.certificate);
    p7.addSigner({
      key: { sign: this.key.sign } as unknown as forge.pki.rsa.PrivateKey,
      certificate: this.key.certificate,
      digestAlgorithm: forge.pki.oids.sha256,
      authenticatedAttributes: [
        { type: forge.pki.oids.contentType, value: forge.pki.oids.data },
        { type: forge.pki.oids.signingTime, value: (signingTime ?? new Date()) as unknown as string },
        { type: forge.pki.oids.messageDigest },
      ],
    });
    p7.sign({ detached: true });
    return Buffer.from(forge.asn1.toDer(p7.toAsn1()).getBytes(), "binary");
  }
}

export async function savePack(doc: PDFDocument, signing?: SigningMaterial): Promise<Uint8Array> {
  // pdf-lib yields to the event loop every 50 objects by default; a pack is small enough to write at once.
  if (!signing) return doc.save({ useObjectStreams: false, objectsPerTick: Infinity });
  pdflibAddPlaceholder({
    pdfDoc: doc,
    reason: "Approved revision issued by Heftwise",
    contactInfo: "",
    name: signing.signerName,
    location: signing.location,
    signatureLength: 16384,
  });
  const unsigned = await doc.save({ useObjectStreams: false, objectsPerTick: Infinity });
  const signer = new PackSigner(openP12(signing.p12, signing.passphrase));
  return new Uint8Array(await new SignPdf().sign(Buffer.from(unsigned), signer));
}
