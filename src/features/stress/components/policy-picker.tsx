import { useId, useState } from 'react';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { describeError } from '../../../components/ui/error-state';
import { Spinner } from '../../../components/ui/spinner';
import { useChooseBomPolicy } from '../hooks';

export type PolicyChoice = { id: string; name: string; isDefault: boolean };

/**
 * The stress policy a BOM is checked against: its own, or the workspace default (which
 * follows the default when it changes). Read-only text for those who may not change it.
 */
export function PolicyPicker({
  bomId,
  bomVersion,
  value,
  policies,
  editable,
  currentName,
}: {
  bomId: string;
  bomVersion: number;
  value: string | null;
  policies: PolicyChoice[];
  editable: boolean;
  currentName: string;
}) {
  const choose = useChooseBomPolicy(bomId);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  const def = policies.find((p) => p.isDefault);

  if (!editable) {
    return (
      <p className="text-sm">
        <span className="text-muted">Stress policy </span>
        <span className="font-medium">{currentName}</span>
        {value === null ? <span className="text-muted"> (workspace default)</span> : null}
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-1">
      <div className="flex items-center gap-2">
        <label htmlFor={id} className="text-sm text-muted">
          Stress policy
        </label>
        <select
          id={id}
          value={value ?? ''}
          disabled={choose.isPending}
          onChange={(event) => {
            setError(null);
            choose.mutate(
              { stressPolicyId: event.target.value || null, version: bomVersion },
              { onError: (e) => setError(isStaleVersion(e) ? STALE_VERSION_MESSAGE : describeError(e)) },
            );
          }}
          className="h-8 rounded-md border border-rule bg-surface px-2 text-sm text-ink hover:border-muted disabled:opacity-60"
        >
          <option value="">Workspace default{def ? ` (${def.name})` : ''}</option>
          {policies.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
        {choose.isPending ? <Spinner className="text-muted" /> : null}
      </div>
      {error ? (
        <p role="alert" className="text-xs font-medium text-brick">
          {error}
        </p>
      ) : null}
    </div>
  );
}
