import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { CautionNotice } from '../../../components/ui/caution-notice';
import { describeError } from '../../../components/ui/error-state';
import { EmptyState } from '../../../components/ui/empty-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { policiesQueryOptions, type StressPolicy } from '../../../features/policies/api';
import { PoliciesTable } from '../../../features/policies/components/policies-table';
import { PolicyForm } from '../../../features/policies/components/policy-form';
import { useCreatePolicy, useMakeDefaultPolicy } from '../../../features/policies/hooks';
import { copyName } from '../../../features/policies/policy-form';

export const stressPoliciesLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(policiesQueryOptions());
  return null;
};

/** The workspace's stress policies: the allowed share of each rating, with where each figure comes from. */
export function StressPoliciesRoute() {
  const session = useSession();
  const { data } = useSuspenseQuery(policiesQueryOptions());
  const [params, setParams] = useSearchParams();
  const createPolicy = useCreatePolicy();
  const makeDefault = useMakeDefaultPolicy();
  const [notice, setNotice] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const [copyingId, setCopyingId] = useState<string | null>(null);
  const mayWrite = can(session.role, 'policies.write');
  const policies = data.items;
  const editingId = mayWrite ? params.get('policy') : null;
  const editing = policies.find((p) => p.id === editingId) ?? null;

  const choose = (id: string | null) =>
    setParams((next) => {
      if (id) next.set('policy', id);
      else next.delete('policy');
      return next;
    });

  const copy = (policy: StressPolicy) => {
    setNotice(null);
    setCopyingId(policy.id);
    createPolicy.mutate(
      { name: copyName(policy.name, policies.map((p) => p.name)), limits: policy.limits, notes: policy.notes },
      {
        onSuccess: (created) => {
          setNotice({ tone: 'success', text: `Copied “${policy.name}” as “${created.name}”. Edit its limits below.` });
          choose(created.id);
        },
        onError: (error) => setNotice({ tone: 'error', text: describeError(error) }),
        onSettled: () => setCopyingId(null),
      },
    );
  };

  const setDefault = (policy: StressPolicy) => {
    setNotice(null);
    makeDefault.mutate(policy.id, {
      onSuccess: () => setNotice({ tone: 'success', text: `“${policy.name}” is now the default: every BOM without a policy of its own is checked against it.` }),
      onError: (error) => setNotice({ tone: 'error', text: describeError(error) }),
    });
  };

  return (
    <>
      <PageHeader
        title="Stress policies"
        description="How far below its rating each part must run: the allowed share of each rating, with its source and how sure that figure is. A BOM uses the default unless it picks a policy of its own."
      />
      <div className="flex flex-col gap-5">
        <CautionNotice>{data.caution}</CautionNotice>
        {notice ? <FormAlert tone={notice.tone}>{notice.text}</FormAlert> : null}
        {policies.length === 0 ? (
          <EmptyState title="No stress policies in this workspace.">Without a policy the stress check cannot run. The seeded policies arrive with a new workspace.</EmptyState>
        ) : (
          <PoliciesTable
            policies={policies}
            mayWrite={mayWrite}
            selectedId={editing?.id ?? null}
            busyId={{ copy: copyingId, makeDefault: makeDefault.isPending ? (makeDefault.variables ?? null) : null }}
            onEdit={(p) => choose(p.id)}
            onCopy={copy}
            onMakeDefault={setDefault}
          />
        )}
        <p className="text-sm text-muted">
          Confidence: <span className="font-medium text-ink">confirmed</span> where the figure was checked against its published source,{' '}
          <span className="font-medium text-ink">from memory</span> where it was recalled, <span className="font-medium text-ink">common practice</span> for the
          trade&apos;s rule of thumb.
        </p>
        {editing ? (
          <section aria-labelledby="policy-form-title" className="flex flex-col gap-3 rounded-lg border border-rule bg-surface p-5">
            <h2 id="policy-form-title" className="text-lg font-semibold">
              Edit “{editing.name}”
            </h2>
            <p className="max-w-prose text-sm text-muted">
              Limits are the share of the part&apos;s rating a check may reach: 80 means the part may run at up to 80 % of its rating. New limits change the stress check
              of every BOM that uses this policy.
            </p>
            <PolicyForm
              key={`${editing.id}-${editing.version}`}
              policy={editing}
              onDone={() => {
                setNotice({ tone: 'success', text: `Saved the limits of “${editing.name}”.` });
                choose(null);
              }}
              onCancel={() => choose(null)}
            />
          </section>
        ) : null}
      </div>
    </>
  );
}
