import { z } from 'zod';
import { email, password, personName, role, idParam } from './common';

export const signupBody = z.strictObject({
  email,
  password,
  name: personName,
  workspaceName: z.string().trim().min(1, 'is required').max(120),
});
export type SignupBody = z.infer<typeof signupBody>;

export const loginBody = z.strictObject({
  email,
  password: z.string().min(1, 'is required').max(200),
});
export type LoginBody = z.infer<typeof loginBody>;

export const switchBody = z.strictObject({ workspaceId: idParam });

export const resetRequestBody = z.strictObject({ email });
export const resetConfirmBody = z.strictObject({
  token: z.string().min(20).max(200),
  password,
});

export const inviteBody = z.strictObject({ email, role });
export type InviteBody = z.infer<typeof inviteBody>;

export const acceptInviteBody = z.strictObject({
  token: z.string().min(20).max(200),
  name: personName,
  password,
});
export type AcceptInviteBody = z.infer<typeof acceptInviteBody>;

export const memberPatchBody = z.strictObject({ role });
export const memberParams = z.strictObject({ userId: idParam });

export const tokenBody = z.strictObject({ name: z.string().trim().min(1, 'is required').max(80) });

export const userOut = z.object({ id: z.string(), email: z.string(), name: z.string() });
export const workspaceOut = z.object({ id: z.string(), name: z.string() });
export const sessionOut = z.object({
  user: userOut,
  workspace: workspaceOut,
  role,
  workspaces: z.array(z.object({ id: z.string(), name: z.string(), role })).optional(),
});
export type SessionOut = z.infer<typeof sessionOut>;

export const memberOut = z.object({
  userId: z.string(),
  email: z.string(),
  name: z.string(),
  role,
  joinedAt: z.string(),
});
export type MemberOut = z.infer<typeof memberOut>;

export const inviteOut = z.object({
  id: z.string(),
  email: z.string(),
  role,
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type InviteOut = z.infer<typeof inviteOut>;

export const tokenOut = z.object({
  id: z.string(),
  name: z.string(),
  createdAt: z.string(),
  lastUsedAt: z.string().nullable(),
});
export type TokenOut = z.infer<typeof tokenOut>;
