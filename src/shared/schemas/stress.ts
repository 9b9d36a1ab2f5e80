import { z } from 'zod';
import { version } from './common';

/** Policy limits are validated by the derating engine's own schema on the server. */
export const policyCreateBody = z.strictObject({
  name: z.string().trim().min(1, 'is required').max(80),
  limits: z.record(z.string(), z.unknown()),
  notes: z.string().max(2000).default(''),
});

export const policyPatchBody = z.strictObject({
  name: z.string().trim().min(1).max(80).optional(),
  limits: z.record(z.string(), z.unknown()).optional(),
  notes: z.string().max(2000).optional(),
  version,
});

export const waiverBody = z.strictObject({
  reason: z.string().trim().min(10, 'say why in at least 10 characters').max(2000),
});

export const swapBody = z.strictObject({
  partId: z.string().regex(/^[1-9][0-9]{0,17}$/, 'must be a record id'),
  version,
});
