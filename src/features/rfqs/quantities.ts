/**
 * Piece counts as buyers and suppliers write them: "10000", "10,000", "10 000", "10k",
 * "2.5k", "1M". `k` is ×1,000 and `M` ×1,000,000 (the SI prefixes); a lower-case `m` is
 * refused, since in SI it means milli. Answers a whole number of pieces from 1, or null.
 */
export function parseQuantity(text: string): number | null {
  // Thousands separators people type: comma, space, no-break spaces, underscore, apostrophe.
  const compact = text.trim().replace(/[\s,_'\u00a0\u202f]/g, '').replace(/pcs?$/i, '');
  const match = /^(\d+)(?:\.(\d+))?([kKM]?)$/.exec(compact);
  if (!match) return null;
  const [, whole, fraction = '', prefix] = match;
  const shift = prefix === 'M' ? 6 : prefix ? 3 : 0;
  // Shift the decimal point in the text, so "1.001k" is exactly 1001 and "1.0005k" is no whole number.
  const trimmed = fraction.replace(/0+$/, '');
  if (trimmed.length > shift) return null;
  const value = Number(whole + trimmed.padEnd(shift, '0'));
  return Number.isSafeInteger(value) && value >= 1 ? value : null;
}

/**
 * A list of quantities typed or pasted in one go: "10k / 50k / 100k", "10k; 50k",
 * "10k, 50k" (a comma followed by a space separates; "100,000" is one number), or
 * "10k 50k 100k" when every piece carries a prefix. Sorted, without repeats.
 */
export function parseQuantityList(text: string): { quantities: number[]; rejected: string[] } {
  const chunks = text.split(/[/;|\n]+|,(?=\s)/).map((chunk) => chunk.trim()).filter(Boolean);
  const pieces: string[] = [];
  for (const chunk of chunks) {
    const words = chunk.split(/\s+/);
    // "10k 50k" is two quantities; "10 000" is one.
    if (words.length > 1 && words.every((word) => /[kKM]$/.test(word))) pieces.push(...words);
    else pieces.push(chunk);
  }
  const quantities = new Set<number>();
  const rejected: string[] = [];
  for (const piece of pieces) {
    const value = parseQuantity(piece);
    if (value === null) rejected.push(piece);
    else quantities.add(value);
  }
  return { quantities: [...quantities].sort((a, b) => a - b), rejected };
}

const countFormat = new Intl.NumberFormat('en-GB');

/** "10,000" for a piece count. */
export function formatCount(value: number): string {
  return countFormat.format(value);
}
