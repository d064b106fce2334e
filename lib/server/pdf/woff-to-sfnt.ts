import "server-only";
import { inflateSync } from "node:zlib";

// WOFF 1.0 (W3C Recommendation, 2012) unpacked to the plain TrueType/OpenType file it wraps. fontkit reads WOFF
// directly but inflates a table again on every access, which makes laying out text slow; plain sfnt is read in place.

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString("latin1", 0, 4) !== "wOFF") throw new Error("not a WOFF 1.0 font");
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const at = 44 + 20 * i;
    const tag = woff.readUInt32BE(at);
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const checksum = woff.readUInt32BE(at + 16);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new Error(`WOFF table ${i} inflates to ${data.length} bytes, not ${origLength}`);
    tables.push({ tag, checksum, data });
  }
  tables.sort((a, b) => a.tag - b.tag);
  const pow = 2 ** Math.floor(Math.log2(numTables));
  const head = Buffer.alloc(12 + 16 * numTables);
  head.writeUInt32BE(flavor, 0);
  head.writeUInt16BE(numTables, 4);
  head.writeUInt16BE(pow * 16, 6);
  head.writeUInt16BE(Math.log2(pow), 8);
  head.writeUInt16BE(numTables * 16 - pow * 16, 10);
  const parts: Buffer[] = [head];
  let offset = head.length;
  tables.forEach((t, i) => {
    const at = 12 + 16 * i;
    head.writeUInt32BE(t.tag, at);
    head.writeUInt32BE(t.checksum, at + 4);
    head.writeUInt32BE(offset, at + 8);
    head.writeUInt32BE(t.data.length, at + 12);
    const padded = Buffer.alloc((t.data.length + 3) & ~3);
    t.data.copy(padded);
    parts.push(padded);
    offset += padded.length;
  });
  return Buffer.concat(parts);
}
