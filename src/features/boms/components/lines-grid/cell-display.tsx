import { countRefDes, refDesMismatch } from '../../../../shared/ref-des';
import { trimDecimal } from '../../../../lib/money';
import type { PartSummary } from '../../api';
import type { GridColumn } from '../../lines/grid-columns';
import { kindLabels } from '../../lines/grid-columns';
import type { Line } from '../../lines/line-types';

/** What the grid knows about the chosen quote of each line, from the running total's cost roll. */
export type ChosenQuote = { quoteId: string | null; supplierName: string | null };

export function WarningMark() {
  return (
    <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3 shrink-0">
      <rect x="1.5" y="1.5" width="9" height="9" rx="1" transform="rotate(45 6 6)" fill="none" stroke="currentColor" strokeWidth="1.4" />
      <path d="M6 3.6v3" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
      <circle cx="6" cy="8.4" r="0.8" fill="currentColor" />
    </svg>
  );
}

/** The reference-designator check: how many designators the text names against the quantity per unit. */
export function refDesCheck(line: Pick<Line, 'refDes' | 'qtyPerUnit'>): string | null {
  const { count, error } = countRefDes(line.refDes);
  if (error) return error;
  if (refDesMismatch(line.refDes, line.qtyPerUnit)) return `${count} designator${count === 1 ? '' : 's'}, qty ${line.qtyPerUnit}`;
  return null;
}

const muted = (text: string) => <span className="truncate text-muted">{text}</span>;

/** A cell's content when it is not being edited. */
export function CellDisplay({
  column,
  line,
  parts,
  chosen,
}: {
  column: GridColumn;
  line: Line;
  parts: ReadonlyMap<string, PartSummary>;
  chosen: ChosenQuote | undefined;
}) {
  switch (column.id) {
    case 'part': {
      if (line.partId) {
        const part = parts.get(line.partId);
        if (!part) return muted(`Part ${line.partId}`);
        return (
          <span className="truncate" title={[part.description, part.package].filter(Boolean).join(' · ')}>
            <span className="font-medium">{part.internalPn}</span>
            {part.mpn ? <span className="text-muted"> {part.mpn}</span> : null}
          </span>
        );
      }
      if (line.unresolved) {
        return (
          <span className="inline-flex min-w-0 items-center gap-1 font-medium text-brick" title="Imported row that matched no part: pick a part to resolve it">
            <WarningMark />
            <span className="truncate">Unresolved: {line.unresolved}</span>
          </span>
        );
      }
      return line.kind === 'part' ? muted('No part') : muted('—');
    }
    case 'kind':
      return <>{kindLabels[line.kind] ?? line.kind}</>;
    case 'check': {
      const problem = refDesCheck(line);
      if (!problem) return null;
      return (
        <span className="inline-flex min-w-0 items-center gap-1 text-copper-dark" title={problem}>
          <WarningMark />
          <span className="truncate">{problem}</span>
        </span>
      );
    }
    case 'attritionPct':
      return line.attritionPct === null ? muted('profile') : <>{trimDecimal(line.attritionPct)} %</>;
    case 'dnp':
      return line.dnp ? (
        <span className="inline-flex items-center gap-1 font-medium">
          <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3">
            <rect x="1" y="1" width="10" height="10" rx="2" fill="currentColor" />
            <path d="M3.2 6.2 5.1 8 8.8 4" fill="none" stroke="white" strokeWidth="1.5" />
          </svg>
          Yes
        </span>
      ) : (
        muted('No')
      );
    case 'currency':
      return line.currency ? <>{line.currency}</> : line.unitCost || line.oneTimeCost ? muted('BOM') : null;
    case 'pinnedQuote': {
      if (line.pinnedQuoteId) {
        const name = chosen?.quoteId === line.pinnedQuoteId ? chosen.supplierName : null;
        return <span className="truncate font-medium">{name ? `Pinned: ${name}` : `Pinned: quote ${line.pinnedQuoteId}`}</span>;
      }
      if (!line.partId) return null;
      return chosen?.supplierName ? muted(`Auto: ${chosen.supplierName}`) : muted('Auto');
    }
    default: {
      const text = column.text(line, { parts });
      return <span className="truncate">{text}</span>;
    }
  }
}
