import { invalid } from './errors';

/**
 * A deep copy of `value` with each `expand` path's id replaced by the object it names
 * (`subscription`, `data.customer`, `items.data.price.product`). Walking into an array
 * applies the rest of the path to each element, as the service does for lists.
 */
export function expandPaths<T>(value: T, paths: string[], lookup: (id: string) => object | undefined): T {
  const copy = structuredClone(value);
  for (const path of paths) walk(copy, path.split('.'), path, lookup);
  return copy;
}

function walk(node: unknown, parts: string[], path: string, lookup: (id: string) => object | undefined): void {
  if (Array.isArray(node)) {
    for (const el of node) walk(el, parts, path, lookup);
    return;
  }
  if (!parts.length || node === null || typeof node !== 'object') return;
  const [head, ...rest] = parts;
  const holder = node as Record<string, unknown>;
  if (!(head in holder)) throw invalid(`This property cannot be expanded (${path}).`, 'expand');
  let child = holder[head];
  if (typeof child === 'string') {
    const found = lookup(child);
    if (!found) throw invalid(`This property cannot be expanded (${path}).`, 'expand');
    child = holder[head] = structuredClone(found);
  }
  walk(child, rest, path, lookup);
}
