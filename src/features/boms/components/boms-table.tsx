import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { StressTally } from '../../../components/ui/stress-status';
import { compareDecimal } from '../../../lib/money';
import type { BomListItem } from '../api';
import { bomStateLabels, formatPerUnit, subtractDecimal } from '../display';
import { GapFigure } from './gap-figure';
import { StateBadge } from './state-badge';

const column = createColumnHelper<BomListItem>();

/** Sorts decimal-string columns exactly; a BOM without a figure sorts last. */
const byDecimal = (pick: (row: BomListItem) => string | null | undefined) => (a: { original: BomListItem }, b: { original: BomListItem }) => {
  const x = pick(a.original);
  const y = pick(b.original);
  if (!x || !y) return x ? -1 : y ? 1 : 0;
  return compareDecimal(x, y);
};

const gapOf = (bom: BomListItem): string | null => {
  const landed = bom.cost?.landedPerUnit;
  if (!landed || !bom.targetUnitCost) return null;
  // The list carries landed cost and target but no gap: landed − target, exactly.
  return subtractDecimal(landed, bom.targetUnitCost);
};

const columns = [
  column.accessor('name', {
    header: 'Name',
    cell: (info) => (
      <Link to={`/boms/${info.row.original.id}/lines`} className="font-medium text-ink underline-offset-2 hover:text-copper-dark hover:underline">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor('revision', { header: 'Revision', meta: { numeric: true }, cell: (info) => `Rev ${info.getValue()}` }),
  column.accessor('state', {
    header: 'State',
    sortingFn: (a, b) => bomStateLabels[a.original.state].localeCompare(bomStateLabels[b.original.state]),
    cell: (info) => <StateBadge state={info.getValue()} />,
  }),
  column.accessor((bom) => bom.cost?.landedPerUnit ?? null, {
    id: 'landedPerUnit',
    header: 'Landed / unit',
    meta: { numeric: true, label: 'Landed cost per unit at planned quantity' },
    sortingFn: byDecimal((bom) => bom.cost?.landedPerUnit),
    cell: (info) => {
      const cost = info.row.original.cost;
      if (!cost || !cost.landedPerUnit) return <span className="text-muted">—</span>;
      return (
        <span title={`At ${cost.qty.toLocaleString('en-GB')} units, costed ${cost.costingDate}`}>
          {formatPerUnit(cost.landedPerUnit)} <span className="text-muted">{cost.currency}</span>
        </span>
      );
    },
  }),
  column.accessor('targetUnitCost', {
    header: 'Target',
    meta: { numeric: true },
    sortingFn: byDecimal((bom) => bom.targetUnitCost),
    cell: (info) => (info.getValue() ? formatPerUnit(info.getValue()) : <span className="text-muted">—</span>),
  }),
  column.accessor((bom) => gapOf(bom), {
    id: 'gap',
    header: 'Gap',
    meta: { numeric: true, label: 'Gap to target' },
    sortingFn: byDecimal(gapOf),
    cell: (info) => (info.row.original.targetUnitCost && info.row.original.cost?.landedPerUnit ? <GapFigure gap={info.getValue()} /> : <span className="text-muted">—</span>),
  }),
  column.accessor((bom) => bom.cost?.leftOut ?? null, {
    id: 'leftOut',
    header: 'Left out',
    meta: { numeric: true, label: 'Lines left out of the cost' },
    cell: (info) => {
      const n = info.getValue();
      if (n === null) return <span className="text-muted">—</span>;
      return n > 0 ? <span className="font-medium text-brick">{n}</span> : <span className="text-muted">0</span>;
    },
  }),
  column.accessor('lineCount', { header: 'Lines', meta: { numeric: true } }),
  column.display({
    id: 'stress',
    header: 'Stress',
    meta: { label: 'Stress tally' },
    cell: (info) => {
      const stress = info.row.original.stress;
      if (!stress) return <span className="text-muted" title="No stress policy in this workspace">—</span>;
      return (
        <Link to={`/boms/${info.row.original.id}/stress-check`} title="Open the stress check" className="block rounded hover:bg-paper">
          <StressTally counts={stress} />
        </Link>
      );
    },
  }),
];

export function BomsTable({ boms, empty }: { boms: BomListItem[]; empty: ReactNode }) {
  const [sorting, onSortingChange] = useUrlSorting();
  return <DataTable label="BOMs" columns={columns} data={boms} getRowId={(bom) => bom.id} empty={empty} sorting={sorting} onSortingChange={onSortingChange} />;
}
