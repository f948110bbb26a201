/** Drawn signatures: decoded where they arrive, and bounded before any decoding (a small file can declare a huge image). */
import { describe, expect, it } from "vitest";
import { drawnSignatureSchema, MAX_SIGNATURE_PIXELS } from "@/lib/drawn-signature";
import { drawnSignaturePng, encodePng } from "@/lib/png";

const schema = drawnSignatureSchema("Sign in the box");
const dataUrl = (png: Buffer) => `data:image/png;base64,${png.toString("base64")}`;

describe("a drawn signature", () => {
  it("a phone-sized drawing is accepted", () => expect(schema.safeParse(dataUrl(drawnSignaturePng(3, 780, 240))).success).toBe(true));
  it("a blank one is refused", () => expect(schema.safeParse(dataUrl(encodePng(200, 80, new Uint8Array(200 * 80 * 4)))).success).toBe(false));
  it("a real, decodable drawing over the pixel limit is refused (by its header, not by decoding it)", () => {
    const side = Math.ceil(Math.sqrt(MAX_SIGNATURE_PIXELS)) + 1;
    const big = drawnSignaturePng(3, side, side);
    expect(big.readUInt32BE(16) * big.readUInt32BE(20)).toBeGreaterThan(MAX_SIGNATURE_PIXELS);
    expect(schema.safeParse(dataUrl(big)).success).toBe(false);
  });
  it("a drawing just within the limit decodes", () => {
    const side = Math.floor(Math.sqrt(MAX_SIGNATURE_PIXELS)) - 1;
    expect(schema.safeParse(dataUrl(drawnSignaturePng(2, side, side))).success).toBe(true);
  });
});
