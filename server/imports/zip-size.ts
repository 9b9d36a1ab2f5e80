/**
 * The total uncompressed size a ZIP declares in its central directory, read without
 * inflating anything; null when the archive is truncated or malformed. Guards against a
 * small upload that would unpack into gigabytes.
 */
export function zipUncompressedSize(buf: Buffer): number | null {
  const EOCD = 0x06054b50;
  const min = Math.max(0, buf.length - 22 - 0xffff);
  let eocd = -1;
  for (let i = buf.length - 22; i >= min; i--) {
    if (buf.readUInt32LE(i) === EOCD) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) return null;
  const entries = buf.readUInt16LE(eocd + 10);
  const cdSize = buf.readUInt32LE(eocd + 12);
  const cdOffset = buf.readUInt32LE(eocd + 16);
  if (cdOffset + cdSize > buf.length) return null;
  let p = cdOffset;
  let total = 0;
  for (let n = 0; n < entries; n++) {
    if (p + 46 > buf.length || buf.readUInt32LE(p) !== 0x02014b50) return null;
    const compressed = buf.readUInt32LE(p + 20);
    const uncompressed = buf.readUInt32LE(p + 24);
    // Ratios beyond 1000:1 only happen in crafted archives; count them as huge.
    total += compressed > 0 && uncompressed / compressed > 1000 ? Number.MAX_SAFE_INTEGER / 2 : uncompressed;
    p += 46 + buf.readUInt16LE(p + 28) + buf.readUInt16LE(p + 30) + buf.readUInt16LE(p + 32);
  }
  return total;
}
