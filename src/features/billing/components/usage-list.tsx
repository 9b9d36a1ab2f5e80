import type { Billing } from '../api';

function Meter({ used, limit }: { used: number; limit: number }) {
  const percent = Math.min(100, Math.round((used / limit) * 100));
  return (
    <div aria-hidden="true" className="mt-1 h-1.5 overflow-hidden rounded-full bg-rule">
      <div className={`h-full ${used >= limit ? 'bg-copper' : 'bg-slate-info'}`} style={{ width: `${percent}%` }} />
    </div>
  );
}

function Row({ label, value, note, used, limit }: { label: string; value: string; note?: string; used?: number; limit?: number | null }) {
  return (
    <div className="py-2">
      <div className="flex items-baseline justify-between gap-4">
        <dt className="text-muted">{label}</dt>
        <dd className="font-medium text-ink tabular-nums">
          {value}
          {note ? <span className="ml-1 font-normal text-muted">{note}</span> : null}
        </dd>
      </div>
      {used !== undefined && typeof limit === 'number' ? <Meter used={used} limit={limit} /> : null}
    </div>
  );
}

/** What the workspace uses against each limit of its plan ("BOMs 2 / 3"). */
export function UsageList({ billing }: { billing: Billing }) {
  const { usage, limits } = billing;
  const seats = usage.members + usage.pendingInvites;
  const invites = usage.pendingInvites === 1 ? '1 pending invitation' : `${usage.pendingInvites} pending invitations`;
  return (
    <dl aria-label="Usage" className="divide-y divide-rule text-sm">
      <Row label="BOMs" value={limits.boms === null ? `${usage.boms}, no limit` : `${usage.boms} / ${limits.boms}`} used={usage.boms} limit={limits.boms} />
      <Row
        label="Members"
        value={limits.members === null ? `${seats}, no limit` : `${seats} / ${limits.members}`}
        note={usage.pendingInvites ? `(${usage.members} + ${invites})` : undefined}
        used={seats}
        limit={limits.members}
      />
      <Row label="Requests for quotation" value={limits.rfq ? 'Included' : 'Not on this plan'} />
      <Row label="API tokens" value={limits.apiTokens ? 'Included' : 'Not on this plan'} />
    </dl>
  );
}
