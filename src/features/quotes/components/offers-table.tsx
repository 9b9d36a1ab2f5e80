import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper, type SortingFn } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { EmptyState } from '../../../components/ui/empty-state';
import { Tag } from '../../../components/ui/tag';
import { compareDecimal, formatMoney, formatUnitPrice } from '../../../lib/money';
import { incotermNames } from '../../../lib/trade-labels';
import type { Offer, QuoteBoard } from '../api';
import { boardOrder, offerReasons } from '../board';

const column = createColumnHelper<Offer>();
const qtyFormat = new Intl.NumberFormat('en-GB');

/** Decimal strings sorted exactly; offers without a value (no FX rate) sort last either way. */
function byDecimal(pick: (o: Offer) => string | null): SortingFn<Offer> {
  return (a, b) => {
    const x = pick(a.original);
    const y = pick(b.original);
    if (x === null || y === null) return x === y ? 0 : x === null ? 1 : -1;
    return compareDecimal(x, y);
  };
}

function Money({ value, currency, places }: { value: string | null; currency: string; places: 'price' | 'money' }) {
  if (value === null) return <span className="text-muted">—</span>;
  return (
    <span className="whitespace-nowrap">
      {places === 'price' ? formatUnitPrice(value) : formatMoney(value, currency)} <span className="text-xs text-muted">{currency}</span>
    </span>
  );
}

/**
 * Every offer for the part side by side at the needed quantity, in landed cost per
 * piece. The cheapest eligible offer carries a "Cheapest landed" tag; an offer that
 * cannot be chosen is greyed and says why in words.
 */
export function OffersTable({ board }: { board: QuoteBoard }) {
  const [sorting, onSortingChange] = useUrlSorting('sort');
  const ccy = board.currency;
  const data = useMemo(() => boardOrder(board.offers), [board.offers]);

  const columns = useMemo(
    () => [
      column.accessor((o) => o.supplierName ?? '', {
        id: 'supplier',
        header: 'Supplier',
        cell: (info) => {
          const offer = info.row.original;
          const cheapest = offer.quoteId === board.cheapestQuoteId;
          const reasons = offerReasons(offer);
          return (
            <div className="flex flex-col items-start gap-1">
              <Link to={`/suppliers/${offer.supplierId}`} className="min-w-40 font-medium text-copper-dark underline-offset-2 hover:underline">
                {offer.supplierName ?? `Supplier #${offer.supplierId}`}
              </Link>
              {cheapest ? <Tag tone="copper">Cheapest landed</Tag> : null}
              {reasons.length ? (
                <span className="max-w-56 text-xs leading-snug">
                  <span className="font-medium">Not eligible:</span> {reasons.join('; ')}
                </span>
              ) : null}
            </div>
          );
        },
      }),
      column.accessor('incoterm', {
        header: 'Incoterm',
        cell: (info) => <abbr title={incotermNames[info.getValue() as keyof typeof incotermNames]} className="no-underline">{info.getValue()}</abbr>,
      }),
      column.accessor((o) => o.leadTimeDays ?? Number.POSITIVE_INFINITY, {
        id: 'leadTimeDays',
        header: 'Lead time',
        meta: { numeric: true },
        cell: (info) => (info.row.original.leadTimeDays === null ? <span className="text-muted">—</span> : `${info.row.original.leadTimeDays} d`),
      }),
      column.accessor('orderQty', {
        header: 'Order qty',
        meta: { numeric: true },
        cell: (info) => (
          <span className="whitespace-nowrap">
            {qtyFormat.format(info.getValue())}
            {info.row.original.excessQty > 0 ? <span className="block text-xs text-muted">+{qtyFormat.format(info.row.original.excessQty)} over</span> : null}
          </span>
        ),
      }),
      column.accessor('unitPrice', {
        header: 'Unit price (quoted)',
        meta: { numeric: true, label: 'Unit price in the quote currency' },
        sortingFn: byDecimal((o) => o.unitPriceConverted),
        cell: (info) => <Money value={info.getValue()} currency={info.row.original.unitPriceCurrency} places="price" />,
      }),
      column.accessor('unitPriceConverted', {
        header: `Unit price (${ccy})`,
        meta: { numeric: true },
        sortingFn: byDecimal((o) => o.unitPriceConverted),
        cell: (info) => <Money value={info.getValue()} currency={ccy} places="price" />,
      }),
      column.accessor('goodsValue', {
        header: 'Goods value',
        meta: { numeric: true },
        sortingFn: byDecimal((o) => o.goodsValue),
        cell: (info) => <Money value={info.getValue()} currency={ccy} places="money" />,
      }),
      column.accessor('excessValue', {
        header: 'Excess value',
        meta: { numeric: true },
        sortingFn: byDecimal((o) => o.excessValue),
        cell: (info) => <Money value={info.getValue()} currency={ccy} places="money" />,
      }),
      column.accessor('landed', {
        header: 'Landed (order)',
        meta: { numeric: true },
        sortingFn: byDecimal((o) => o.landed),
        cell: (info) => <Money value={info.getValue()} currency={ccy} places="money" />,
      }),
      column.accessor('landedPerPiece', {
        header: 'Landed per piece',
        meta: { numeric: true },
        sortingFn: byDecimal((o) => o.landedPerPiece),
        cell: (info) => (
          <span className="font-semibold">
            <Money value={info.getValue()} currency={ccy} places="price" />
          </span>
        ),
      }),
    ],
    [board.cheapestQuoteId, ccy],
  );

  return (
    <DataTable
      label="Offers"
      columns={columns}
      data={data}
      getRowId={(o) => o.quoteId}
      sorting={sorting}
      onSortingChange={onSortingChange}
      rowClassName={(o) => (o.quoteId === board.cheapestQuoteId ? 'bg-copper/5' : !o.eligible ? 'bg-paper/70 text-muted [&_a]:text-muted' : undefined)}
      empty={
        <EmptyState title="No quotes for this part yet.">
          Add a quote on the part&apos;s page, or import a supplier&apos;s price list from Suppliers.
        </EmptyState>
      }
    />
  );
}
