import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../../components/ui/data-table/data-table';
import { Tag } from '../../../../components/ui/tag';
import { compareDecimal, formatUnitPrice } from '../../../../lib/money';
import type { CostLine, CostRoll } from '../../api';
import { formatCount, formatPerUnit, formatTotal, warningText } from '../../display';

const column = createColumnHelper<CostLine>();

const money = (key: 'goodsValue' | 'origin' | 'freight' | 'insurance' | 'duty' | 'fees' | 'destination' | 'assembly' | 'landed', header: string, currency: string) =>
  column.accessor(key, {
    header,
    meta: { numeric: true },
    sortingFn: (a, b) => compareDecimal(a.original[key], b.original[key]),
    cell: (info) => formatTotal(info.getValue(), currency),
  });

function columnsFor(currency: string) {
  return [
    column.accessor((line) => line.refDes ?? '', {
      id: 'refDes',
      header: 'Ref des',
      cell: (info) => (info.getValue() ? <span className="whitespace-nowrap">{info.getValue()}</span> : <span className="text-muted">—</span>),
    }),
    column.accessor((line) => line.internalPn ?? line.category, {
      id: 'part',
      header: 'Part',
      cell: (info) => {
        const line = info.row.original;
        if (!line.partId) return <span className="text-muted capitalize">{line.kind}</span>;
        // Every offer for this part at this line's quantity, side by side.
        const board = `/quote-board?part=${encodeURIComponent(line.partId)}${line.requiredQty ? `&qty=${line.requiredQty}` : ''}`;
        return (
          <span className="whitespace-nowrap">
            <Link to={board} className="font-medium underline-offset-2 hover:underline" title="Open the quote board for this part">
              {line.internalPn}
            </Link>
            {line.mpn ? <span className="text-muted"> {line.mpn}</span> : null}
          </span>
        );
      },
    }),
    column.accessor((line) => line.supplierName ?? '', {
      id: 'supplier',
      header: 'Supplier',
      cell: (info) => {
        const line = info.row.original;
        if (!line.supplierName) return <span className="text-muted">—</span>;
        return (
          <span className="whitespace-nowrap">
            {line.supplierName}
            {line.incoterm ? <span className="text-muted"> {line.incoterm}</span> : null}
          </span>
        );
      },
    }),
    column.accessor('requiredQty', { header: 'Required', meta: { numeric: true, label: 'Required quantity' }, cell: (info) => formatCount(info.getValue()) }),
    column.accessor('orderQty', {
      header: 'Order qty',
      meta: { numeric: true, label: 'Order quantity' },
      cell: (info) => {
        const line = info.row.original;
        return (
          <span title={line.excessQty ? `${formatCount(line.excessQty)} more than required (excess ${formatTotal(line.excessValue, currency)} ${currency})` : undefined}>
            {formatCount(info.getValue())}
          </span>
        );
      },
    }),
    column.accessor('unitPrice', {
      header: 'Unit price',
      meta: { numeric: true, label: 'Unit price in the quote currency' },
      sortingFn: (a, b) => compareDecimal(a.original.unitPriceConverted ?? '0', b.original.unitPriceConverted ?? '0'),
      cell: (info) => {
        const line = info.row.original;
        if (!line.unitPrice) return <span className="text-muted">—</span>;
        return (
          <span className="whitespace-nowrap">
            {formatUnitPrice(line.unitPrice)} <span className="text-muted">{line.unitPriceCurrency}</span>
          </span>
        );
      },
    }),
    column.accessor('unitPriceConverted', {
      header: `Unit price ${currency}`,
      meta: { numeric: true, label: `Unit price in ${currency}` },
      enableSorting: false,
      cell: (info) => (info.getValue() ? formatUnitPrice(info.getValue()!) : <span className="text-muted">—</span>),
    }),
    money('goodsValue', 'Goods', currency),
    money('origin', 'Origin', currency),
    money('freight', 'Freight', currency),
    money('insurance', 'Insurance', currency),
    money('duty', 'Duty', currency),
    money('fees', 'Fees', currency),
    money('destination', 'Destination', currency),
    money('assembly', 'Assembly', currency),
    money('landed', 'Landed', currency),
    column.accessor('landedPerUnit', {
      header: 'Landed / unit',
      meta: { numeric: true, label: 'Landed cost per unit' },
      sortingFn: (a, b) => compareDecimal(a.original.landedPerUnit, b.original.landedPerUnit),
      cell: (info) => <span className="font-medium">{formatPerUnit(info.getValue())}</span>,
    }),
    column.accessor((line) => line.warnings.map((w) => warningText(w.code)).join(', '), {
      id: 'warnings',
      header: 'Warnings',
      cell: (info) => {
        const line = info.row.original;
        return (
          <span className="flex flex-wrap gap-1">
            {line.status === 'dnp' ? <Tag tone="muted">DNP, not bought</Tag> : null}
            {line.status === 'left_out' ? <Tag tone="warning">Left out</Tag> : null}
            {line.warnings.map((w) => (
              <Tag key={w.code} tone={line.status === 'left_out' ? 'warning' : 'copper'}>
                <span title={w.detail}>{warningText(w.code)}</span>
              </Tag>
            ))}
          </span>
        );
      },
    }),
  ];
}

/** Every line of a cost roll: chosen supplier, quantities, prices, each adder and the landed cost. */
export function CostLinesTable({ cost }: { cost: CostRoll }) {
  // One column set per currency: new columns on every render would make the table rebuild its models while scrolling.
  const columns = useMemo(() => columnsFor(cost.currency), [cost.currency]);
  return (
    <DataTable
      label="Cost roll lines"
      columns={columns}
      data={cost.lines}
      getRowId={(line) => line.lineId}
      rowClassName={(line) => (line.status === 'left_out' ? 'bg-brick/5' : line.status === 'dnp' ? 'text-muted' : undefined)}
      empty={<p className="rounded-lg border border-dashed border-rule bg-surface px-4 py-6 text-center text-sm text-muted">This BOM has no lines to cost yet.</p>}
    />
  );
}
