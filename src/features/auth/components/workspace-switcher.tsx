import { roleLabels } from '../../../lib/roles';
import { SelectField } from '../../../components/ui/select-field';
import type { Session } from '../api';
import { useSwitchWorkspace } from '../hooks';

/**
 * The current workspace; a picker when the person belongs to several. Each workspace
 * is listed with the role held there, since the role changes what the app offers.
 */
export function WorkspaceSwitcher({ session }: { session: Session }) {
  const switchWorkspace = useSwitchWorkspace();
  const workspaces = session.workspaces ?? [];

  if (workspaces.length < 2) {
    return <span className="truncate text-sm font-medium text-ink">{session.workspace.name}</span>;
  }

  return (
    <div className="flex items-center gap-2">
      <SelectField
        label="Workspace"
        hideLabel
        value={session.workspace.id}
        disabled={switchWorkspace.isPending}
        onChange={(event) => switchWorkspace.mutate(event.target.value)}
        options={workspaces.map((workspace) => ({
          value: workspace.id,
          label: `${workspace.name} (${roleLabels[workspace.role]})`,
        }))}
      />
      {switchWorkspace.isError ? (
        <span role="alert" className="text-xs text-brick">
          Could not switch workspace. Try again.
        </span>
      ) : null}
    </div>
  );
}
