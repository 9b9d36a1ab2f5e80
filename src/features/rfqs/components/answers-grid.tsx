import { Link } from 'react-router-dom';
import type { RfqDetail } from '../api';

/**
 * What each supplier answered for each part: an offer (which opens the part's quote board,
 * where it stands beside the others in landed cost), a decline, or nothing yet.
 */
export function AnswersGrid({ rfq, offersPath }: { rfq: RfqDetail; offersPath: (partId: string) => string }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-surface">
      <table aria-label="Answers by part" className="w-full border-collapse text-sm">
        <thead>
          <tr>
            <th scope="col" className="border-b border-rule px-3 py-2 text-left text-xs font-semibold tracking-wide text-muted uppercase">
              Part
            </th>
            {rfq.recipients.map((r) => (
              <th key={r.id} scope="col" className="border-b border-rule px-3 py-2 text-left text-xs font-semibold tracking-wide text-muted uppercase">
                {r.supplierName}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rfq.items.map((item) => (
            <tr key={item.id} className="border-b border-rule/70 last:border-b-0">
              <th scope="row" className="px-3 py-1.5 text-left font-normal">
                <span className="font-medium">{item.internalPn}</span>
                {item.mpn ? <span className="text-muted"> · {item.mpn}</span> : null}
                {item.description ? <span className="block text-xs text-muted">{item.description}</span> : null}
              </th>
              {rfq.recipients.map((r) => {
                const answer = r.answers.find((a) => a.itemId === item.id);
                return (
                  <td key={r.id} className="px-3 py-1.5">
                    {!answer ? (
                      <span className="text-muted">No answer yet</span>
                    ) : answer.declined ? (
                      <span className="text-muted">Declined</span>
                    ) : (
                      <Link
                        to={offersPath(item.partId)}
                        aria-label={`Offer from ${r.supplierName} for ${item.internalPn} on the quote board`}
                        className="font-medium text-copper-dark underline-offset-2 hover:underline"
                      >
                        Offer on the quote board
                      </Link>
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
