/**
 * A signature drawn on a canvas, sent as a PNG data URL. It is decoded here, so a damaged or blank
 * image is refused with a field message when it arrives, instead of breaking the pack that will
 * carry it later. The size in the PNG header is checked before decoding: a small file can declare
 * an enormous image.
 */
import { PNG } from "pngjs";
import { z } from "zod";

const MAX_SIDE = 4000;
/**
 * A signature pad is a strip, drawn at most at twice the screen's resolution (signature-field.tsx):
 * about 0.5 megapixels on a tablet. Two megapixels bounds the work of decoding one to a few tens of
 * milliseconds, so a crafted image cannot stall the server for everyone else.
 */
export const MAX_SIGNATURE_PIXELS = 2_000_000;

/** The header's checks, cheap and synchronous: a PNG, of a size a signature pad draws. */
function plausible(bytes: Buffer): boolean {
  if (bytes.byteLength < 33 || bytes.subarray(0, 8).toString("hex") !== "89504e470d0a1a0a") return false;
  const width = bytes.readUInt32BE(16);
  const height = bytes.readUInt32BE(20);
  return width > 0 && height > 0 && width <= MAX_SIDE && height <= MAX_SIDE && width * height <= MAX_SIGNATURE_PIXELS;
}

/**
 * Decodes the image off the event loop's critical path — pngjs's streaming parser inflates through
 * zlib on libuv's thread pool — and checks that something was drawn: at least one pixel that is not
 * fully transparent.
 */
function drawn(bytes: Buffer): Promise<boolean> {
  return new Promise((resolve) => {
    new PNG().parse(bytes, (err, png) => {
      if (err || !png) return resolve(false);
      const data = png.data;
      for (let i = 3; i < data.length; i += 4) if (data[i] !== 0) return resolve(true);
      resolve(false);
    });
  });
}

/**
 * The schema of a drawn signature; its output is the PNG's bytes. `message` says what to do. Its
 * check is asynchronous: parse it with `parseOrThrowAsync`.
 */
export const drawnSignatureSchema = (message: string) =>
  z
    .string()
    .max(700_000, "The signature image is too large")
    .regex(/^data:image\/png;base64,[A-Za-z0-9+/=]+$/, message)
    .transform(async (dataUrl, ctx) => {
      const bytes = Buffer.from(dataUrl.slice(dataUrl.indexOf(",") + 1), "base64");
      if (plausible(bytes) && (await drawn(bytes))) return bytes;
      ctx.addIssue({ code: "custom", message });
      return z.NEVER;
    });
