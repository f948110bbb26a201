/**
 * Each organisation's document-signing certificate, made on first use and kept server-side as an
 * encrypted PKCS#12. The passphrase is derived from NEXTAUTH_SECRET, so a copy of the database alone
 * does not give the key away. The certificate is self-signed: readers report the signature valid
 * and the issuer unknown, which is what Heftwise claims — this organisation signed it, unaltered.
 */
import { createHmac, generateKeyPairSync, randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import forge from "node-forge";
import { getDb } from "@/db/client";
import { signingKeys } from "@/db/schema";
import { config } from "./config";

const passphraseFor = (organisationId: string) =>
  createHmac("sha256", config().secret).update(`heftwise-signing-key:${organisationId}`).digest("hex");

export function makeP12(organisationName: string, passphrase: string): { p12: Uint8Array; certificatePem: string } {
  // Node makes the RSA key natively (milliseconds); node-forge wraps it in a certificate and PKCS#12.
  const { privateKey, publicKey } = generateKeyPairSync("rsa", {
    modulusLength: 2048,
    publicKeyEncoding: { type: "spki", format: "pem" },
    privateKeyEncoding: { type: "pkcs8", format: "pem" },
  });
  const key = forge.pki.privateKeyFromPem(privateKey);
  const cert = forge.pki.createCertificate();
  cert.publicKey = forge.pki.publicKeyFromPem(publicKey);
  cert.serialNumber = `01${randomBytes(15).toString("hex")}`;
  cert.validity.notBefore = new Date(Date.now() - 60_000);
  cert.validity.notAfter = new Date(Date.now() + 10 * 365 * 86_400_000);
  // UTF8String values: node-forge writes PrintableString otherwise, which breaks on names like "Café".
  const utf8 = forge.asn1.Type.UTF8 as unknown as forge.asn1.Class;
  const subject = [
    {
      name: "commonName",
      value: forge.util.encodeUtf8(`${organisationName} document signing (Heftwise)`.slice(0, 64)),
      valueTagClass: utf8,
    },
    { name: "organizationName", value: forge.util.encodeUtf8(organisationName.slice(0, 64)), valueTagClass: utf8 },
  ];
  cert.setSubject(subject);
  cert.setIssuer(subject);
  cert.setExtensions([
    { name: "basicConstraints", cA: false },
    { name: "keyUsage", digitalSignature: true, nonRepudiation: true },
  ]);
  cert.sign(key, forge.md.sha256.create());
  const asn1 = forge.pkcs12.toPkcs12Asn1(key, [cert], passphrase, {
    algorithm: "aes256",
    friendlyName: "heftwise-signing",
  });
  const der = forge.asn1.toDer(asn1).getBytes();
  return { p12: new Uint8Array(Buffer.from(der, "binary")), certificatePem: forge.pki.certificateToPem(cert) };
}

/** Whether the stored PKCS#12 opens with the passphrase (it does not after NEXTAUTH_SECRET changes). */
function opens(p12: Uint8Array, passphrase: string): boolean {
  try {
    forge.pkcs12.pkcs12FromAsn1(forge.asn1.fromDer(Buffer.from(p12).toString("binary")), false, passphrase);
    return true;
  } catch {
    return false;
  }
}

const checked = new Set<string>();

export async function getSigningKey(
  organisationId: string,
  organisationName: string,
): Promise<{ p12: Uint8Array; passphrase: string; certificatePem: string }> {
  const db = await getDb();
  const passphrase = passphraseFor(organisationId);
  const existing = await db.query.signingKeys.findFirst({ where: eq(signingKeys.organisationId, organisationId) });
  if (existing && (checked.has(organisationId) || opens(existing.p12, passphrase))) {
    checked.add(organisationId);
    return { p12: existing.p12, passphrase, certificatePem: existing.certificatePem };
  }
  if (existing) {
    // The secret changed since the key was made: a new certificate signs from now on. Packs signed
    // before stay verifiable on /verify (it compares their bytes, not the key).
    console.warn(
      `signing key of organisation ${organisationId} no longer opens with NEXTAUTH_SECRET: making a new one`,
    );
    const made = makeP12(organisationName, passphrase);
    await db
      .update(signingKeys)
      .set({ p12: made.p12, certificatePem: made.certificatePem, createdAt: new Date() })
      .where(eq(signingKeys.organisationId, organisationId));
    checked.add(organisationId);
    return { p12: made.p12, passphrase, certificatePem: made.certificatePem };
  }
  const made = makeP12(organisationName, passphrase);
  // Two first uses at once: the second insert does nothing and both read the one stored key.
  await db
    .insert(signingKeys)
    .values({ organisationId, p12: made.p12, certificatePem: made.certificatePem })
    .onConflictDoNothing();
  const stored = await db.query.signingKeys.findFirst({ where: eq(signingKeys.organisationId, organisationId) });
  return { p12: stored!.p12, passphrase, certificatePem: stored!.certificatePem };
}
