import { roles } from '../../../shared/schemas/common';
import { roleLabels } from '../../../lib/roles';

export const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));
