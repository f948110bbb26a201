/**
 * WOFF 1.0 → TrueType, with Node's zlib. The fonts ship as .woff (from @fontsource); fontkit can read
 * WOFF but inflates it in JavaScript every time a PDF embeds it (about 70 ms a font), so the pack
 * converts each font once and embeds the TrueType bytes.
 */
import { inflateSync } from "node:zlib";

export function woffToTtf(woff: Uint8Array): Uint8Array {
  const src = Buffer.from(woff.buffer, woff.byteOffset, woff.byteLength);
  if (src.toString("latin1", 0, 4) !== "wOFF") throw new Error("not a WOFF 1.0 font");
  const flavor = src.readUInt32BE(4);
  const numTables = src.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = 44 + i * 20;
    const offset = src.readUInt32BE(at + 4);
    const compLength = src.readUInt32BE(at + 8);
    const origLength = src.readUInt32BE(at + 12);
    const raw = src.subarray(offset, offset + compLength);
    return {
      tag: src.subarray(at, at + 4),
      checksum: src.readUInt32BE(at + 16),
      data: compLength < origLength ? inflateSync(raw) : raw,
    };
  });
  let power = 1;
  while (power * 2 <= numTables) power *= 2;
  const header = Buffer.alloc(12 + 16 * numTables);
  header.writeUInt32BE(flavor, 0);
  header.writeUInt16BE(numTables, 4);
  header.writeUInt16BE(power * 16, 6);
  header.writeUInt16BE(Math.log2(power), 8);
  header.writeUInt16BE(numTables * 16 - power * 16, 10);
  const bodies: Buffer[] = [];
  let offset = header.length;
  tables.forEach((t, i) => {
    const record = 12 + i * 16;
    t.tag.copy(header, record);
    header.writeUInt32BE(t.checksum, record + 4);
    header.writeUInt32BE(offset, record + 8);
    header.writeUInt32BE(t.data.length, record + 12);
    const padded = Buffer.alloc((t.data.length + 3) & ~3);
    t.data.copy(padded);
    bodies.push(padded);
    offset += padded.length;
  });
  return new Uint8Array(Buffer.concat([header, ...bodies]));
}
