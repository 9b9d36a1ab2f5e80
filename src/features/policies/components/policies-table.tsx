import { Fragment } from 'react';
import { Button } from '../../../components/ui/button';
import { Tag } from '../../../components/ui/tag';
import { formatPercent } from '../../../lib/percent';
import type { PolicyLimit, StressPolicy, TjAllowed } from '../api';
import { confidenceWords, LIMIT_ROWS, limitAt } from '../limit-rows';

function LimitCell({ limit }: { limit: PolicyLimit | undefined }) {
  if (!limit) return <span className="text-muted">—</span>;
  return (
    <div className="flex flex-col items-end gap-0.5">
      <span className="flex items-center gap-1.5">
        {limit.confidence ? <Tag tone={limit.confidence === 'C' ? 'ok' : 'muted'}>{confidenceWords[limit.confidence]}</Tag> : null}
        <span className="font-medium tabular-nums">{formatPercent(limit.value)}</span>
      </span>
      {limit.source ? <span className="max-w-44 text-right text-xs text-muted">{limit.source}</span> : null}
    </div>
  );
}

/** "Tj max − 25 °C", or "min(Tj max − 30 °C, 125 °C)" with a cap. */
export function tjText(tj: TjAllowed): string {
  const margin = `Tj max − ${tj.marginC} °C`;
  return tj.capC === null || tj.capC === undefined ? margin : `min(${margin}, ${tj.capC} °C)`;
}

function TjCell({ tj }: { tj: TjAllowed }) {
  return (
    <div className="flex flex-col items-end gap-0.5">
      <span className="flex items-center gap-1.5">
        {tj.confidence ? <Tag tone={tj.confidence === 'C' ? 'ok' : 'muted'}>{confidenceWords[tj.confidence]}</Tag> : null}
        <span className="font-medium whitespace-nowrap tabular-nums">{tjText(tj)}</span>
      </span>
      {tj.source ? <span className="max-w-44 text-right text-xs text-muted">{tj.source}</span> : null}
    </div>
  );
}

/**
 * The policies side by side: each limit as a percentage of the rating with its
 * confidence in words and its source, a column per policy with what may be done to it.
 */
export function PoliciesTable({
  policies,
  mayWrite,
  selectedId,
  busyId,
  onEdit,
  onCopy,
  onMakeDefault,
}: {
  policies: StressPolicy[];
  mayWrite: boolean;
  selectedId: string | null;
  busyId: { copy: string | null; makeDefault: string | null };
  onEdit: (policy: StressPolicy) => void;
  onCopy: (policy: StressPolicy) => void;
  onMakeDefault: (policy: StressPolicy) => void;
}) {
  const groups = [...new Set(LIMIT_ROWS.map((r) => r.groupLabel))];
  return (
    <div className="relative overflow-x-auto rounded-lg border border-rule bg-surface">
      <table aria-label="Stress policies" className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-rule align-top">
            <th scope="col" className="sticky left-0 z-10 min-w-44 bg-surface px-3 py-2 text-left text-xs font-semibold tracking-wide text-muted uppercase">
              Limit, as a share of the rating
            </th>
            {policies.map((p) => (
              <th key={p.id} scope="col" className={`px-3 py-2 text-right font-normal ${selectedId === p.id ? 'bg-copper/5' : ''}`}>
                <div className="flex flex-col items-end gap-1.5">
                  <span className="text-base font-semibold text-ink">{p.name}</span>
                  <span className="flex flex-wrap justify-end gap-1">
                    {p.isDefault ? <Tag tone="copper">Default</Tag> : null}
                    {p.seededFrom ? <Tag tone="muted">Seeded</Tag> : null}
                  </span>
                  {mayWrite ? (
                    <span className="flex flex-wrap justify-end gap-1">
                      <Button size="sm" variant="secondary" onClick={() => onEdit(p)}>
                        Edit limits<span className="sr-only"> of {p.name}</span>
                      </Button>
                      <Button size="sm" variant="quiet" pending={busyId.copy === p.id} onClick={() => onCopy(p)}>
                        Copy<span className="sr-only"> {p.name}</span>
                      </Button>
                      {!p.isDefault ? (
                        <Button size="sm" variant="quiet" pending={busyId.makeDefault === p.id} onClick={() => onMakeDefault(p)}>
                          Make default<span className="sr-only"> {p.name}</span>
                        </Button>
                      ) : null}
                    </span>
                  ) : null}
                </div>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {groups.map((group) => (
            <Fragment key={group}>
              <tr className="bg-paper/60">
                <th scope="rowgroup" colSpan={policies.length + 1} className="px-3 py-1.5 text-left text-xs font-semibold tracking-wide text-muted uppercase">
                  <span className="sticky left-3">{group}</span>
                </th>
              </tr>
              {LIMIT_ROWS.filter((r) => r.groupLabel === group).map((r) => (
                <tr key={r.id} className="border-t border-rule/60 align-top">
                  <th scope="row" className="sticky left-0 z-10 bg-surface px-3 py-2 text-left font-normal">
                    {r.label}
                  </th>
                  {policies.map((p) => (
                    <td key={p.id} className={`px-3 py-2 ${selectedId === p.id ? 'bg-copper/5' : ''}`}>
                      <LimitCell limit={limitAt(p.limits, r)} />
                    </td>
                  ))}
                </tr>
              ))}
              {group === 'Transistor' ? (
                <tr className="border-t border-rule/60 align-top">
                  <th scope="row" className="sticky left-0 z-10 bg-surface px-3 py-2 text-left font-normal">
                    Junction temperature allowed
                  </th>
                  {policies.map((p) => (
                    <td key={p.id} className={`px-3 py-2 ${selectedId === p.id ? 'bg-copper/5' : ''}`}>
                      <TjCell tj={p.limits.transistor.junctionTemp} />
                    </td>
                  ))}
                </tr>
              ) : null}
            </Fragment>
          ))}
          <tr className="border-t border-rule align-top">
            <th scope="row" className="sticky left-0 z-10 bg-surface px-3 py-2 text-left font-normal text-muted">
              Notes
            </th>
            {policies.map((p) => (
              <td key={p.id} className="max-w-64 px-3 py-2 text-right text-xs text-muted">
                {p.notes || '—'}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </div>
  );
}
