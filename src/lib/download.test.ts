import { describe, expect, it } from 'vitest';
import { filenameFromDisposition, formatBytes } from './download';

describe('filenameFromDisposition', () => {
  it('reads the plain and the extended form of RFC 6266 (the extended one wins)', () => {
    expect(filenameFromDisposition('attachment; filename="Arc lighter rev 2 costed BOM.xlsx"')).toBe('Arc lighter rev 2 costed BOM.xlsx');
    expect(filenameFromDisposition('attachment; filename=plain.xlsx')).toBe('plain.xlsx');
    // RFC 6266 section 5 example: filename* carries UTF-8, percent-encoded.
    expect(filenameFromDisposition(`attachment; filename="EURO rates"; filename*=utf-8''%e2%82%ac%20rates`)).toBe('€ rates');
  });

  it('drops any folder and gives nothing for an empty header', () => {
    expect(filenameFromDisposition('attachment; filename="../../etc/passwd"')).toBe('passwd');
    expect(filenameFromDisposition(null)).toBeNull();
    expect(filenameFromDisposition('attachment')).toBeNull();
  });
});

describe('formatBytes', () => {
  it('counts in decimal units', () => {
    expect(formatBytes(512)).toBe('512 B');
    expect(formatBytes(48_213)).toBe('48.2 kB');
    expect(formatBytes(1_300_000)).toBe('1.3 MB');
  });
});
