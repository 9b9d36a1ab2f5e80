import { formatDate } from '../../../../lib/format';
import { formatCount } from '../../quantities';
import type { RfqReply } from '../../reply-api';

/** What the buyer asks: who, for what, in which quantities, by when, in their own words. */
export function ReplySummary({ view }: { view: RfqReply }) {
  const parts = view.items.length === 1 ? '1 part' : `${view.items.length} parts`;
  return (
    <section aria-labelledby="request-title" className="flex flex-col gap-3">
      <div>
        <p className="text-sm text-muted">
          <span className="font-medium text-ink">{view.buyer}</span> asks <span className="font-medium text-ink">{view.supplier}</span> for a
          quotation
        </p>
        <h1 id="request-title" className="mt-1 text-2xl font-semibold tracking-tight">
          {view.title}
        </h1>
      </div>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 rounded-lg border border-rule bg-surface px-4 py-3 text-sm">
        <dt className="text-muted">Reply by</dt>
        <dd className="font-medium tabular-nums">{formatDate(view.replyBy)}</dd>
        <dt className="text-muted">Quantities</dt>
        <dd className="font-medium tabular-nums">{view.quantities.map((q) => `${formatCount(q)} pcs`).join(' · ')}</dd>
        <dt className="text-muted">Parts</dt>
        <dd className="font-medium">{parts}</dd>
      </dl>
      {view.message ? (
        <blockquote className="rounded-lg border-l-4 border-copper bg-surface px-4 py-3 text-sm whitespace-pre-line">{view.message}</blockquote>
      ) : null}
    </section>
  );
}
