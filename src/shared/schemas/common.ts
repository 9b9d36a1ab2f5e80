import { z } from 'zod';

/** Ids are opaque strings in the API (bigint keys in the database). */
export const idParam = z.string().regex(/^[1-9][0-9]{0,17}$/, 'must be a record id');

export const idParams = z.strictObject({ id: idParam });

/** Optimistic locking: every update names the version it was based on. */
export const version = z.number().int().min(1);

export const email = z.string().trim().toLowerCase().max(254).email('must be an e-mail address');

export const password = z
  .string()
  .min(10, 'must be at least 10 characters')
  .max(200, 'must be at most 200 characters');

export const personName = z.string().trim().min(1, 'is required').max(120);

export const roles = ['owner', 'designer', 'buyer', 'viewer'] as const;
export const role = z.enum(roles);
export type Role = z.infer<typeof role>;

export const listQuery = z.strictObject({
  limit: z.coerce.number().int().min(1).max(500).default(100),
  cursor: z.string().max(200).optional(),
  q: z.string().max(200).optional(),
});
