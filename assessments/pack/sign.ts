/**
 * Saves a pack, and for an approved revision signs it with a PKCS#7 (CMS) signature that standard
 * PDF readers and poppler's pdfsig check. One signature per file: pdf-lib's placeholder helper does
 * not support more.
 */
import { pdflibAddPlaceholder } from "@signpdf/placeholder-pdf-lib";
import { P12Signer } from "@signpdf/signer-p12";
import { SignPdf } from "@signpdf/signpdf";
import type { PDFDocument } from "pdf-lib";

export interface SigningMaterial {
  p12: Uint8Array;
  passphrase: string;
  signerName: string;
  location: string;
}

export async function savePack(doc: PDFDocument, signing?: SigningMaterial): Promise<Uint8Array> {
  if (!signing) return doc.save({ useObjectStreams: false });
  pdflibAddPlaceholder({
    pdfDoc: doc,
    reason: "Approved revision issued by Heftwise",
    contactInfo: "",
    name: signing.signerName,
    location: signing.location,
    signatureLength: 16384,
  });
  const unsigned = await doc.save({ useObjectStreams: false });
  const signer = new P12Signer(Buffer.from(signing.p12), { passphrase: signing.passphrase });
  return new Uint8Array(await new SignPdf().sign(Buffer.from(unsigned), signer));
}
