/**
 * The quantities typed for the volume curve, separated by commas or spaces, as whole
 * numbers or with a k for thousands ("500, 1k, 2.5k"). A comma always separates
 * quantities, so no thousands separators. At most 40, each 1 to 100,000,000.
 */
export function parseQuantities(text: string): { ok: true; quantities: number[] } | { ok: false; message: string } {
  const tokens = text.split(/[,;\s]+/).map((t) => t.trim()).filter(Boolean);
  if (tokens.length === 0) return { ok: true, quantities: [] };
  const quantities: number[] = [];
  for (const token of tokens) {
    const k = /^(\d+(?:\.\d+)?)k$/i.exec(token);
    const value = k ? Number(k[1]) * 1000 : /^\d+$/.test(token) ? Number(token) : Number.NaN;
    if (!Number.isInteger(value) || value < 1 || value > 100_000_000) return { ok: false, message: `“${token}” is not a whole quantity from 1 to 100,000,000` };
    quantities.push(value);
  }
  const unique = [...new Set(quantities)].sort((a, b) => a - b);
  if (unique.length > 40) return { ok: false, message: 'At most 40 quantities at a time' };
  return { ok: true, quantities: unique };
}

/**
 * `count` quantities spread evenly on a log scale from `from` to `to`, rounded to whole
 * units: enough points for price breaks and MOQ steps to show between the typed ones.
 */
export function logSpaced(from: number, to: number, count: number): number[] {
  const lo = Math.max(1, Math.min(from, to));
  const hi = Math.max(lo, Math.max(from, to));
  if (count <= 1 || lo === hi) return [lo];
  const step = Math.log(hi / lo) / (count - 1);
  const out = new Set<number>();
  for (let i = 0; i < count; i++) out.add(Math.round(lo * Math.exp(step * i)));
  out.add(hi);
  return [...out].sort((a, b) => a - b);
}
