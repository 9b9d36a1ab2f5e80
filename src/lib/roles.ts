import type { Role } from '../shared/schemas/common';

/** How a workspace role reads on screen. */
export const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  designer: 'Designer',
  buyer: 'Buyer',
  viewer: 'Viewer',
};
