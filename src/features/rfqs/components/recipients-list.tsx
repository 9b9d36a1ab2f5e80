import { formatDateTime } from '../../../lib/format';
import type { RfqRecipient } from '../api';
import { RecipientStatusBadge } from './recipient-status';

function When({ label, at }: { label: string; at: string | null }) {
  if (!at) return null;
  return (
    <span className="whitespace-nowrap">
      {label} <time dateTime={at}>{formatDateTime(at)}</time>
    </span>
  );
}

/** Each supplier asked, with its status in words and when it was sent, opened, reminded and answered. */
export function RecipientsList({ recipients, partCount }: { recipients: RfqRecipient[]; partCount: number }) {
  return (
    <ul aria-label="Suppliers asked" className="divide-y divide-rule rounded-lg border border-rule bg-surface">
      {recipients.map((r) => {
        const offers = r.answers.filter((a) => !a.declined).length;
        const declined = r.answers.filter((a) => a.declined).length;
        return (
          <li key={r.id} aria-label={r.supplierName} className="flex flex-col gap-1 px-4 py-3 text-sm sm:flex-row sm:items-center sm:justify-between">
            <div className="flex flex-wrap items-center gap-2">
              <span className="font-medium">{r.supplierName}</span>
              <RecipientStatusBadge status={r.status} />
              {r.answers.length ? (
                <span className="text-muted tabular-nums">
                  {offers} of {partCount} priced{declined ? `, ${declined} declined` : ''}
                </span>
              ) : null}
            </div>
            <div className="flex flex-wrap gap-x-4 gap-y-0.5 text-xs text-muted tabular-nums">
              <When label="Sent" at={r.sentAt} />
              <When label="Opened" at={r.openedAt} />
              <When label="Reminded" at={r.remindedAt} />
              <When label="Answered" at={r.answeredAt} />
            </div>
          </li>
        );
      })}
    </ul>
  );
}
