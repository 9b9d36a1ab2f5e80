import { Tag } from '../../../components/ui/tag';
import type { Quote } from '../api';

const today = () => new Date().toISOString().slice(0, 10);

/**
 * "Expired" on a quote past its end date, "Not yet valid" before its start: such quotes
 * stay in every list, greyed, and say so in words. A quote in force shows nothing.
 */
export function QuoteStatus({ quote, on = today() }: { quote: Quote; on?: string }) {
  if (quote.expired) return <Tag tone="muted">Expired</Tag>;
  if (quote.validFrom && quote.validFrom > on) return <Tag tone="muted">Not yet valid</Tag>;
  return null;
}
