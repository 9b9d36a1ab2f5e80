import type { ReactNode } from 'react';
import type { Part } from '../api';
import { categoryLabels, mountLabels } from '../part-form';
import { formatRating, ratingFieldsFor } from '../ratings';

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-xs font-semibold tracking-wide text-muted uppercase">{term}</dt>
      <dd className="text-sm">{children || <span className="text-muted">—</span>}</dd>
    </div>
  );
}

/** A part's fields as a datasheet summary. */
export function PartFields({ part }: { part: Part }) {
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-4">
      <Item term="Category">{categoryLabels[part.category]}</Item>
      <Item term="MPN">{part.mpn}</Item>
      <Item term="Maker">{part.manufacturer}</Item>
      <Item term="Package">{part.package}</Item>
      <Item term="Mount">{mountLabels[part.mount]}</Item>
      <Item term="Pins">
        <span className="tabular-nums">{part.pins}</span>
      </Item>
      <Item term="HS code">
        <span className="tabular-nums">{part.hsCode ?? ''}</span>
      </Item>
      <Item term="Unit weight">
        {part.unitWeightG === null ? '' : <span className="tabular-nums">{Number(part.unitWeightG)} g</span>}
      </Item>
      {part.description ? (
        <div className="col-span-full">
          <Item term="Description">{part.description}</Item>
        </div>
      ) : null}
    </dl>
  );
}

/** The ratings in engineering form with units ("4.7 kΩ", "2 kV"); a missing one says so. */
export function PartRatings({ part }: { part: Part }) {
  const defs = ratingFieldsFor(part.category);
  if (defs.length === 0) {
    return <p className="text-sm text-muted">A {categoryLabels[part.category].toLowerCase()} part carries no electrical ratings.</p>;
  }
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-2 sm:grid-cols-2">
      {defs.map((def) => {
        const value = part.ratings[def.key];
        const missing = value === undefined || value === null;
        return (
          <div key={def.key} className="flex items-baseline justify-between gap-4 border-b border-rule/70 py-1">
            <dt className="text-sm text-muted">{def.label}</dt>
            <dd className={`text-sm tabular-nums ${missing ? 'text-muted' : 'font-medium'}`}>{missing ? 'Not stated' : formatRating(def, value)}</dd>
          </div>
        );
      })}
    </dl>
  );
}
