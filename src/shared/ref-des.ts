/**
 * Reference designators as people write them: `R1, R2`, `R1-R4`, `C3 C5-C7`. Counts them so
 * the grid can warn when the count disagrees with the quantity per unit.
 */
export function expandRefDes(text: string): { refs: string[]; error?: string } {
  const refs: string[] = [];
  for (const token of text.split(/[\s,;]+/).filter(Boolean)) {
    const range = /^([A-Za-z]+)(\d+)[-–:]([A-Za-z]*)(\d+)$/.exec(token);
    if (range) {
      const [, prefix, a, prefix2, b] = range;
      if (prefix2 && prefix2 !== prefix) return { refs, error: `${token}: a range keeps one prefix` };
      const from = Number(a);
      const to = Number(b);
      if (to < from) return { refs, error: `${token}: the range runs backwards` };
      if (to - from > 10000) return { refs, error: `${token}: the range is too long` };
      for (let n = from; n <= to; n++) refs.push(`${prefix}${n}`);
    } else if (/^[A-Za-z]+\d*[A-Za-z0-9_.]*$/.test(token)) {
      refs.push(token);
    } else {
      return { refs, error: `${token}: not a reference designator` };
    }
  }
  return { refs };
}

export function countRefDes(text: string): { count: number; error?: string } {
  const { refs, error } = expandRefDes(text);
  return { count: refs.length, error };
}

/** True when designators are given and their count differs from the quantity per unit. */
export function refDesMismatch(text: string, qtyPerUnit: string | number): boolean {
  const { refs, error } = expandRefDes(text);
  if (error || refs.length === 0) return false;
  return refs.length !== Number(qtyPerUnit);
}
