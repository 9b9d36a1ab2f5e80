import { useQuery } from '@tanstack/react-query';
import { partQuotesQueryOptions } from '../../api';
import { formatUnitPrice } from '../../../../lib/money';
import { SelectEditor, type EditorProps } from './cell-editors';

/**
 * The pinned-quote cell being edited: no pin (the cost roll picks the cheapest eligible
 * quote) or one quote for the line's part. Buyers may change this and nothing else.
 */
export function QuotePicker({ partId, ...props }: Omit<EditorProps, 'seed'> & { partId: string }) {
  const quotes = useQuery(partQuotesQueryOptions(partId));
  if (!quotes.data) {
    return (
      <span role="status" className="flex h-full items-center border-2 border-slate-info px-2 text-xs text-muted">
        {quotes.isError ? 'Quotes could not be loaded' : 'Loading quotes…'}
      </span>
    );
  }
  const options = [
    { value: '', label: 'No pin: cheapest eligible' },
    ...quotes.data.map((q) => {
      const first = q.priceBreaks[0];
      const price = first ? ` from ${formatUnitPrice(first.unitPrice)} ${q.currency}` : '';
      return { value: q.id, label: `${q.supplierName} · ${q.incoterm}${price}, MOQ ${q.moq}${q.expired ? ' (expired)' : ''}` };
    }),
  ];
  return <SelectEditor {...props} options={options} />;
}
