import type { z } from 'zod';
import { errors, type ErrorDetail } from './errors';

/** Parses one part of a request; failures become a 400 listing every problem by path. */
export function parseInput<S extends z.ZodType>(schema: S, value: unknown, where: 'body' | 'params' | 'query'): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const details: ErrorDetail[] = result.error.issues.map((issue) => {
    const keys = issue.code === 'unrecognized_keys' ? (issue as { keys?: string[] }).keys ?? [] : [];
    const path = [...issue.path, ...(keys.length === 1 ? keys : [])].map(String).join('.');
    return { path: path || where, message: issue.message };
  });
  throw errors.validation(`The request ${where} is not valid.`, details);
}
