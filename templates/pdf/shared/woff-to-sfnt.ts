import { inflateSync } from "node:zlib";

// fontkit reads a WOFF table by table, each in a buffer of its own length; a blank glyph
// (the space) stored at the very end of the glyf table then reads past that buffer and
// rendering fails with "Offset is outside the bounds of the DataView" (IBM Plex Mono's
// subsets do this). As a plain TrueType file the same font reads fine, so packet fonts
// are unwrapped to one before they are registered.

const WOFF_SIGNATURE = 0x774f4646; // "wOFF"
const WOFF_HEADER_BYTES = 44;
const WOFF_ENTRY_BYTES = 20;
const SFNT_HEADER_BYTES = 12;
const SFNT_ENTRY_BYTES = 16;

const align4 = (n: number) => (n + 3) & ~3;

/** The TrueType/OpenType bytes inside a WOFF 1.0 file (tables inflated, directory rebuilt). */
export function woffToSfnt(woff: Uint8Array): Uint8Array {
  const src = new DataView(woff.buffer, woff.byteOffset, woff.byteLength);
  if (src.getUint32(0) !== WOFF_SIGNATURE) throw new Error("Not a WOFF 1.0 font");
  const flavor = src.getUint32(4);
  const numTables = src.getUint16(12);

  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = WOFF_HEADER_BYTES + i * WOFF_ENTRY_BYTES;
    const offset = src.getUint32(at + 4);
    const compLength = src.getUint32(at + 8);
    const origLength = src.getUint32(at + 12);
    const stored = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? new Uint8Array(inflateSync(stored)) : stored;
    if (data.length !== origLength) throw new Error("WOFF table has the wrong length after inflating");
    return { tag: src.getUint32(at), checksum: src.getUint32(at + 16), data };
  });

  let offset = SFNT_HEADER_BYTES + numTables * SFNT_ENTRY_BYTES;
  const placed = tables.map((t) => {
    const at = offset;
    offset += align4(t.data.length);
    return { ...t, offset: at };
  });

  const out = new Uint8Array(offset);
  const dst = new DataView(out.buffer);
  // Binary-search fields of the sfnt header, as the OpenType spec defines them.
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  dst.setUint32(0, flavor);
  dst.setUint16(4, numTables);
  dst.setUint16(6, searchRange);
  dst.setUint16(8, entrySelector);
  dst.setUint16(10, numTables * 16 - searchRange);
  placed.forEach((t, i) => {
    const at = SFNT_HEADER_BYTES + i * SFNT_ENTRY_BYTES;
    dst.setUint32(at, t.tag);
    dst.setUint32(at + 4, t.checksum);
    dst.setUint32(at + 8, t.offset);
    dst.setUint32(at + 12, t.data.length);
    out.set(t.data, t.offset);
  });
  return out;
}
