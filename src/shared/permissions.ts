import type { Role } from './schemas/common';

/**
 * Who may do what, per workspace role (product brief, "Roles"). The server's route
 * table names one of these actions per route; the client hides what a role may not do.
 */
const everyone: readonly Role[] = ['owner', 'designer', 'buyer', 'viewer'];

export const permissions = {
  'workspace.read': everyone,
  'members.read': everyone,
  'members.manage': ['owner'],
  'tokens.own': everyone,
  'audit.read': ['owner'],
  'boms.read': everyone,
  'boms.write': ['owner', 'designer'],
  'boms.release': ['owner'],
  'lines.pin': ['owner', 'designer', 'buyer'],
  'snapshots.write': ['owner', 'designer', 'buyer'],
  'parts.read': everyone,
  'parts.write': ['owner', 'designer'],
  'suppliers.read': everyone,
  'suppliers.write': ['owner', 'buyer'],
  'quotes.read': everyone,
  'quotes.write': ['owner', 'buyer'],
  'fx.read': everyone,
  'fx.write': ['owner', 'buyer'],
  'profiles.read': everyone,
  'profiles.write': ['owner', 'buyer'],
  'policies.read': everyone,
  'policies.write': ['owner', 'designer'],
  'rfqs.read': everyone,
  'rfqs.write': ['owner', 'buyer'],
  'export': everyone,
  'billing.manage': ['owner'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof permissions;

export function can(role: Role | undefined | null, action: Action): boolean {
  if (!role) return false;
  return (permissions[action] as readonly Role[]).includes(role);
}
