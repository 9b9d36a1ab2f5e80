import { roles, type Role } from '../../../shared/schemas/common';
import { SelectField } from '../../../components/ui/select-field';
import { describeError } from '../../../components/ui/error-state';
import type { Member } from '../api';
import { useChangeMemberRole } from '../hooks';
import { roleOptions } from './role-options';

function isRole(value: string): value is Role {
  return (roles as readonly string[]).includes(value);
}

/** An owner changes a member's role in place; each row keeps its own pending state. */
export function MemberRoleCell({ member }: { member: Member }) {
  const changeRole = useChangeMemberRole();
  return (
    <div className="flex items-center gap-2">
      <SelectField
        label={`Role for ${member.name}`}
        hideLabel
        value={changeRole.isPending ? changeRole.variables.role : member.role}
        disabled={changeRole.isPending}
        onChange={(event) => {
          const role = event.target.value;
          if (isRole(role) && role !== member.role) changeRole.mutate({ userId: member.userId, role });
        }}
        options={roleOptions}
      />
      {changeRole.isError ? (
        <span role="alert" className="text-xs text-brick">
          {describeError(changeRole.error)}
        </span>
      ) : null}
    </div>
  );
}
