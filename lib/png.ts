/**
 * A minimal PNG writer (zlib from Node), for images Heftwise draws itself: the stand-in signature of
 * the scripted demo pack and of tests. People's real signatures come from the browser's canvas.
 */
import { crc32, deflateSync } from "node:zlib";

function chunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "latin1"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body) >>> 0);
  return Buffer.concat([length, body, crc]);
}

/** Encodes RGBA pixels (row by row) as a PNG. */
export function encodePng(width: number, height: number, rgba: Uint8Array): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // RGBA
  const raw = Buffer.alloc((width * 4 + 1) * height);
  for (let y = 0; y < height; y++)
    Buffer.from(rgba.buffer, rgba.byteOffset + y * width * 4, width * 4).copy(raw, y * (width * 4 + 1) + 1);
  return Buffer.concat([
    Buffer.from("89504e470d0a1a0a", "hex"),
    chunk("IHDR", header),
    chunk("IDAT", deflateSync(raw)),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

/** A pen stroke across a transparent strip: a signature-like squiggle, different for each seed. */
export function drawnSignaturePng(seed = 1, width = 240, height = 80): Buffer {
  const rgba = new Uint8Array(width * height * 4);
  const dot = (x: number, y: number) => {
    for (let dy = -1; dy <= 1; dy++)
      for (let dx = -1; dx <= 1; dx++) {
        const px = Math.round(x + dx);
        const py = Math.round(y + dy);
        if (px < 0 || py < 0 || px >= width || py >= height) continue;
        const i = (py * width + px) * 4;
        rgba.set([22, 48, 43, 255], i);
      }
  };
  for (let t = 0; t <= 1; t += 0.0008) {
    const x = 12 + t * (width - 24);
    const y = height / 2 + Math.sin(t * (9 + seed) * Math.PI) * (height / 3) * Math.cos(t * 3 * Math.PI);
    dot(x, y);
  }
  return encodePng(width, height, rgba);
}
