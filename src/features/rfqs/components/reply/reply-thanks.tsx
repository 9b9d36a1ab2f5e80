import { Button } from '../../../../components/ui/button';
import { Tag } from '../../../../components/ui/tag';
import { formatDate } from '../../../../lib/format';
import type { RfqAnswerBody } from '../../../../shared/schemas/rfqs';
import { formatCount } from '../../quantities';
import type { ReplyResult, RfqReply } from '../../reply-api';

type Line = { itemId: string; part: string; declined: boolean; detail: string | null };

function offerDetail(answer: Extract<RfqAnswerBody['items'][number], { declined: false }>): string {
  const breaks = answer.priceBreaks.map((b) => `${formatCount(b.minQty)} pcs at ${b.unitPrice} ${answer.currency}`).join(', ');
  return [
    breaks,
    answer.incoterm,
    `MOQ ${formatCount(answer.moq)}`,
    `multiple ${formatCount(answer.orderMultiple)}`,
    `lead time ${answer.leadTimeDays} days`,
    `valid until ${formatDate(answer.validUntil)}`,
  ].join(' · ');
}

/** What was sent, part by part: from the form's own body, or (after a sheet) from the answers the server now holds. */
function sentLines(view: RfqReply, body: RfqAnswerBody | null): Line[] {
  const label = (itemId: string) => {
    const item = view.items.find((i) => i.itemId === itemId);
    return item ? [item.internalPn, item.mpn].filter(Boolean).join(' · ') : `Item ${itemId}`;
  };
  if (body) {
    return body.items.map((answer) => ({
      itemId: answer.itemId,
      part: label(answer.itemId),
      declined: answer.declined,
      detail: answer.declined ? null : offerDetail(answer),
    }));
  }
  return view.answers.map((answer) => ({ itemId: answer.itemId, part: label(answer.itemId), declined: answer.declined, detail: null }));
}

/** The page after a successful answer: thanks, and a list of what reached the buyer. */
export function ReplyThanks({
  view,
  result,
  body,
  onAgain,
}: {
  view: RfqReply;
  result: ReplyResult;
  body: RfqAnswerBody | null;
  onAgain: () => void;
}) {
  const lines = sentLines(view, body);
  const offers = result.quotes === 1 ? '1 offer' : `${result.quotes} offers`;
  const declined = result.declined === 1 ? '1 part declined' : `${result.declined} parts declined`;
  return (
    <section aria-labelledby="thanks-title" className="flex flex-col gap-4 rounded-lg border border-verdigris/40 bg-surface p-5">
      <div role="status">
        <h2 id="thanks-title" className="text-xl font-semibold">
          Thank you — your quotation has been sent
        </h2>
        <p className="mt-1 text-sm text-muted">
          {view.buyer} has {offers} and {declined} from {view.supplier}.
        </p>
      </div>
      <ul aria-label="What was sent" className="divide-y divide-rule rounded-md border border-rule">
        {lines.map((line) => (
          <li key={line.itemId} className="flex flex-col gap-1 px-3 py-2 text-sm">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <span className="font-medium">{line.part}</span>
              {line.declined ? <Tag tone="muted">Declined</Tag> : <Tag tone="ok">Offer sent</Tag>}
            </div>
            {line.detail ? <p className="text-muted tabular-nums">{line.detail}</p> : null}
          </li>
        ))}
      </ul>
      <p className="text-sm text-muted">
        If something changes, this link takes a new answer until {formatDate(view.expiresAt)} unless the buyer closes the request; a new
        answer adds new offers for the parts you fill in.
      </p>
      <div>
        <Button variant="secondary" onClick={onAgain}>
          Send another answer
        </Button>
      </div>
    </section>
  );
}
