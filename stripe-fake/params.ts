import { z } from 'zod';
import { invalid } from './errors';
import type { Metadata } from './objects';

/**
 * Request parameters arrive form-encoded with bracket notation and are decoded by qs, so
 * every leaf is a string. These helpers read them back into typed values and answer the
 * service's 400 naming the parameter (`line_items[0][price]`) when one is missing, unknown
 * or malformed. Unknown parameters are refused on purpose: a parameter this fake does not
 * emulate should fail loudly here rather than be ignored silently.
 */
export const text = z.string();
export const nonEmpty = z.string().min(1, 'must not be empty');
export const bool = z.enum(['true', 'false']).transform((v) => v === 'true');
export const integer = (min: number, max: number) =>
  z.string().regex(/^\d+$/, 'must be an integer').transform(Number).pipe(z.number().int().min(min).max(max));
/** `metadata[key]=value`; an empty value removes a key and `metadata=` removes them all (on update). */
export const metadata = z.union([z.literal(''), z.record(z.string(), z.string())]);
/** `lookup_keys[0]=a` or `lookup_keys[]=a` arrive as an array, a single `lookup_keys=a` as a string. */
export const stringList = z.union([z.string(), z.array(z.string())]).transform((v) => (Array.isArray(v) ? v : [v]));

export const listParams = {
  limit: integer(1, 100).optional(),
  starting_after: z.string().optional(),
  ending_before: z.string().optional(),
};

export function paramName(path: PropertyKey[]): string {
  return path.map((p, i) => (i === 0 ? String(p) : `[${String(p)}]`)).join('');
}

function valueAt(input: unknown, path: PropertyKey[]): unknown {
  let v = input;
  for (const p of path) v = v && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[p] : undefined;
  return v;
}

/** Validates `raw` (the decoded body or query) without its `expand`, which is returned beside it. */
export function parseParams<S extends z.ZodType>(schema: S, raw: unknown): { params: z.output<S>; expand: string[] } {
  const { expand, ...rest } = (raw && typeof raw === 'object' ? raw : {}) as Record<string, unknown>;
  const expandParsed = z.array(z.string()).optional().safeParse(typeof expand === 'string' ? [expand] : expand);
  if (!expandParsed.success) throw invalid('Invalid expand: must be a list of strings.', 'expand');
  const parsed = schema.safeParse(rest);
  if (parsed.success) return { params: parsed.data, expand: expandParsed.data ?? [] };
  const issue = parsed.error.issues[0];
  if (issue.code === 'unrecognized_keys') {
    const param = paramName([...issue.path, issue.keys[0]]);
    throw invalid(`Received unknown parameter: ${param} (this local fake emulates only the parameters listed in its README)`, param, 'parameter_unknown');
  }
  const param = paramName(issue.path);
  if (valueAt(rest, issue.path) === undefined) throw invalid(`Missing required param: ${param}.`, param, 'parameter_missing');
  throw invalid(`Invalid ${param}: ${issue.message}`, param, 'parameter_invalid');
}

/** Applies an update's metadata the way the service does: merge, empty value deletes, empty string clears. */
export function mergeMetadata(current: Metadata, update: Metadata | '' | undefined): Metadata {
  if (update === undefined) return current;
  if (update === '') return {};
  const next = { ...current };
  for (const [k, v] of Object.entries(update)) {
    if (v === '') delete next[k];
    else next[k] = v;
  }
  return next;
}

/** Metadata given at creation: empty values are simply left out. */
export function initialMetadata(given: Metadata | '' | undefined): Metadata {
  return mergeMetadata({}, given);
}
