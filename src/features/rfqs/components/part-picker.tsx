import { useState } from 'react';
import { keepPreviousData, useQuery, type QueryKey, type UseQueryOptions } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { LoadingState } from '../../../components/ui/loading-state';
import { describeError } from '../../../components/ui/error-state';
import { fieldMessage } from '../../../lib/form-errors';
import { useDebouncedValue } from '../../../lib/use-debounced-value';

/** What the picker needs of a part. */
export type PartChoice = { id: string; internalPn: string; mpn: string; manufacturer: string; description: string; package: string };

/**
 * The parts library's own search, handed in by the screen (areas do not import each
 * other): query options for the first matches of a text, under the library's own keys.
 */
export type PartSearch<T extends PartChoice, K extends QueryKey> = (q: string) => UseQueryOptions<T[], Error, T[], K>;

const partName = (part: PartChoice) => [part.internalPn, part.mpn].filter(Boolean).join(' · ');

/** Search the library and collect the parts to ask for. */
export function PartPicker<T extends PartChoice, K extends QueryKey>({
  search,
  value,
  onChange,
  error,
}: {
  search: PartSearch<T, K>;
  value: PartChoice[];
  onChange: (next: PartChoice[]) => void;
  error?: string;
}) {
  const [find, setFind] = useState('');
  const q = useDebouncedValue(find, 300);
  const results = useQuery({ ...search(q), placeholderData: keepPreviousData });
  const chosen = new Set(value.map((p) => p.id));

  return (
    <div className="flex flex-col gap-3">
      <TextField
        label="Find parts"
        type="search"
        value={find}
        onChange={(event) => setFind(event.target.value)}
        placeholder="10k 0603, 2kV 1nF, MPN…"
        hint="Search in the trade's words: a value, a package, an MPN."
      />
      {results.isPending ? (
        <LoadingState label="Searching parts…" />
      ) : results.isError ? (
        <p role="alert" className="text-sm text-brick">
          {describeError(results.error)}
        </p>
      ) : results.data.length === 0 ? (
        <p className="text-sm text-muted">{q ? 'No part matches this search.' : 'The parts library is empty.'}</p>
      ) : (
        <ul aria-label="Matching parts" className="max-h-64 divide-y divide-rule overflow-y-auto rounded-md border border-rule bg-surface">
          {results.data.map((part) => (
            <li key={part.id} className="flex items-center justify-between gap-3 px-3 py-1.5 text-sm">
              <span className="min-w-0">
                <span className="font-medium">{partName(part)}</span>
                <span className="ml-2 text-muted">{[part.package, part.description].filter(Boolean).join(' · ')}</span>
              </span>
              <Button
                size="sm"
                variant="secondary"
                aria-label={`Add ${part.internalPn}`}
                disabled={chosen.has(part.id)}
                onClick={() => onChange([...value, part])}
              >
                {chosen.has(part.id) ? 'Added' : 'Add'}
              </Button>
            </li>
          ))}
        </ul>
      )}
      <div className="flex flex-col gap-1">
        <h4 className="text-sm font-medium">
          Parts to quote <span className="font-normal text-muted tabular-nums">({value.length})</span>
        </h4>
        {value.length === 0 ? (
          <p className="text-sm text-muted">None yet: add parts from the search above.</p>
        ) : (
          <ul aria-label="Parts to quote" className="divide-y divide-rule rounded-md border border-rule bg-surface">
            {value.map((part) => (
              <li key={part.id} className="flex items-center justify-between gap-3 px-3 py-1.5 text-sm">
                <span className="font-medium">{partName(part)}</span>
                <Button size="sm" variant="quiet" aria-label={`Remove ${part.internalPn}`} onClick={() => onChange(value.filter((p) => p.id !== part.id))}>
                  Remove
                </Button>
              </li>
            ))}
          </ul>
        )}
        {error ? <p className="text-xs font-medium text-brick">{fieldMessage('Parts', error)}</p> : null}
      </div>
    </div>
  );
}
