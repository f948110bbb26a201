/** Drawn signatures: bounded by their PNG header, decoded off the event loop's critical path, refused when blank. */
import { describe, expect, it } from "vitest";
import { drawnSignatureSchema, MAX_SIGNATURE_PIXELS } from "@/lib/drawn-signature";
import { drawnSignaturePng, encodePng } from "@/lib/png";

const schema = drawnSignatureSchema("Sign in the box");
const dataUrl = (png: Buffer) => `data:image/png;base64,${png.toString("base64")}`;
const accepted = async (png: Buffer) => (await schema.safeParseAsync(dataUrl(png))).success;

describe("a drawn signature", () => {
  it("a phone-sized drawing is accepted", async () =>
    expect(await accepted(drawnSignaturePng(3, 780, 240))).toBe(true));
  it("a blank one is refused", async () =>
    expect(await accepted(encodePng(200, 80, new Uint8Array(200 * 80 * 4)))).toBe(false));
  it("a damaged one is refused", async () => {
    const png = drawnSignaturePng(3, 240, 80);
    png.fill(0, 40, 60);
    expect(await accepted(png)).toBe(false);
  });
  it("a real, decodable drawing over the pixel limit is refused (by its header, not by decoding it)", async () => {
    const side = Math.ceil(Math.sqrt(MAX_SIGNATURE_PIXELS)) + 1;
    const big = drawnSignaturePng(3, side, side);
    expect(big.readUInt32BE(16) * big.readUInt32BE(20)).toBeGreaterThan(MAX_SIGNATURE_PIXELS);
    expect(await accepted(big)).toBe(false);
  });
  it("a drawing just within the limit decodes", async () => {
    const side = Math.floor(Math.sqrt(MAX_SIGNATURE_PIXELS)) - 1;
    expect(await accepted(drawnSignaturePng(2, side, side))).toBe(true);
  });
  it("its check is asynchronous: a synchronous parse is not possible by mistake", () => {
    expect(() => schema.safeParse(dataUrl(drawnSignaturePng(3, 240, 80)))).toThrow();
  });
});
