/**
 * PNG images (the QR code, drawn signatures) as PDF image objects: colour in one stream, the alpha
 * channel as a soft mask, both compressed with Node's zlib. pngjs decodes any PNG — palette, grey,
 * 16-bit, interlaced — to 8-bit RGBA with Node's zlib too; pdf-lib's own PNG path decodes and
 * compresses in JavaScript, several times slower.
 */
import { deflateSync } from "node:zlib";
import { PNG } from "pngjs";
import type { PDFDocument, PDFRef } from "pdf-lib";

export interface PackImage {
  ref: PDFRef;
  width: number;
  height: number;
}

export function embedPng(doc: PDFDocument, bytes: Uint8Array): PackImage {
  const { width, height, data } = PNG.sync.read(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
  const pixels = width * height;
  const rgb = Buffer.allocUnsafe(pixels * 3);
  const alpha = Buffer.allocUnsafe(pixels);
  let opaque = true;
  for (let i = 0; i < pixels; i++) {
    rgb[i * 3] = data[i * 4];
    rgb[i * 3 + 1] = data[i * 4 + 1];
    rgb[i * 3 + 2] = data[i * 4 + 2];
    alpha[i] = data[i * 4 + 3];
    if (alpha[i] !== 255) opaque = false;
  }
  const image = {
    Type: "XObject",
    Subtype: "Image",
    Width: width,
    Height: height,
    BitsPerComponent: 8,
    Filter: "FlateDecode",
  };
  const { context } = doc;
  const mask = opaque
    ? undefined
    : context.register(context.stream(deflateSync(alpha), { ...image, ColorSpace: "DeviceGray" }));
  const ref = context.register(
    context.stream(deflateSync(rgb), { ...image, ColorSpace: "DeviceRGB", ...(mask ? { SMask: mask } : {}) }),
  );
  return { ref, width, height };
}
