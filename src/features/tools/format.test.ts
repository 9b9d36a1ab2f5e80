import { describe, expect, it } from 'vitest';
import { formatSi } from './format';

describe('formatSi', () => {
  it('writes charge, energy and time with engineering prefixes (SI Brochure, 9th ed., prefixes; from memory)', () => {
    expect(formatSi(5.28e-6, 'C')).toBe('5.28 µC');
    expect(formatSi(0.006336, 'J')).toBe('6.34 mJ');
    expect(formatSi(0.0968, 's')).toBe('96.8 ms');
    expect(formatSi(0.35, 'J')).toBe('350 mJ');
  });

  it('keeps long times in seconds and rounds across a prefix boundary', () => {
    expect(formatSi(1500, 's')).toBe('1500 s');
    expect(formatSi(0.99996e-3, 'C')).toBe('1 mC');
    expect(formatSi(0, 'J')).toBe('0 J');
    expect(formatSi(Number.NaN, 'J')).toBe('—');
  });
});
