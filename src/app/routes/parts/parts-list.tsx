import { useEffect, useState } from 'react';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { partCategories, type PartCategory } from '../../../shared/schemas/trade';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { Button } from '../../../components/ui/button';
import { ColumnChooser } from '../../../components/ui/data-table/column-chooser';
import { useStoredColumnVisibility } from '../../../components/ui/data-table/use-stored-column-visibility';
import { EmptyState } from '../../../components/ui/empty-state';
import { FormPanel } from '../../../components/ui/form-panel';
import { PageHeader } from '../../../components/ui/page-header';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useSession } from '../../../features/auth/session-context';
import { partsQueryOptions, type PartFilters } from '../../../features/parts/api';
import { PartForm } from '../../../features/parts/components/part-form';
import { defaultPartColumnVisibility, partColumns, PartsTable } from '../../../features/parts/components/parts-table';
import { categoryLabels } from '../../../features/parts/part-form';

const categoryOptions = [{ value: '', label: 'All categories' }, ...partCategories.map((c) => ({ value: c, label: categoryLabels[c] }))];

/** The server-side filters in the address: `?q=10k 0603&category=resistor`. */
function partFilters(params: URLSearchParams): PartFilters {
  const category = params.get('category') ?? '';
  return {
    q: params.get('q')?.trim() || undefined,
    category: (partCategories as readonly string[]).includes(category) ? (category as PartCategory) : undefined,
  };
}

export const partsListLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(partsQueryOptions(partFilters(new URL(request.url).searchParams)));
    return null;
  };

/**
 * The search box: its own text while typing, written to the address once typing pauses
 * (the server searches; the address keeps the search for reload and sharing).
 */
function PartSearch() {
  const [params, setParams] = useSearchParams();
  const q = params.get('q') ?? '';
  const [text, setText] = useState(q);
  const settled = useDebouncedValue(text, 350);

  useEffect(() => {
    if (settled.trim() === q.trim()) return;
    setParams(
      (next) => {
        if (settled.trim()) next.set('q', settled.trim());
        else next.delete('q');
        return next;
      },
      { replace: true },
    );
  }, [settled, q, setParams]);

  return (
    <TextField
      label="Search parts"
      type="search"
      value={text}
      onChange={(event) => setText(event.target.value)}
      placeholder="10k 0603"
      hint="In the trade's words: a value, a package, an MPN, a maker."
      className="min-w-64 flex-1"
    />
  );
}

export function PartsListRoute() {
  const session = useSession();
  const navigate = useNavigate();
  const [params, setParams] = useSearchParams();
  const filters = partFilters(params);
  const { data: parts } = useSuspenseQuery(partsQueryOptions(filters));
  const [visibility, setVisibility] = useStoredColumnVisibility('farthing.parts.columns', defaultPartColumnVisibility);
  const [creating, setCreating] = useState(false);
  const canWrite = can(session.role, 'parts.write');
  const filtered = Boolean(filters.q || filters.category);

  const newPart = canWrite && !creating ? <Button onClick={() => setCreating(true)}>New part</Button> : null;

  return (
    <>
      <PageHeader
        title="Parts"
        description="The workspace's parts library: every part with its ratings, HS code, datasheets and quotes."
        actions={newPart}
      />
      {creating ? (
        <FormPanel title="New part" description="Ratings are typed as the datasheet writes them; the value each reads as shows beside it.">
          <PartForm onDone={(part) => navigate(`/parts/${part.id}`)} onCancel={() => setCreating(false)} />
        </FormPanel>
      ) : (
        <>
          <div className="mb-4 flex flex-wrap items-start gap-3">
            <PartSearch />
            <SelectField
              label="Category"
              options={categoryOptions}
              value={filters.category ?? ''}
              onChange={(event) =>
                setParams(
                  (next) => {
                    if (event.target.value) next.set('category', event.target.value);
                    else next.delete('category');
                    return next;
                  },
                  { replace: true },
                )
              }
            />
            <div className="mt-6 ml-auto flex items-center gap-3">
              <ColumnChooser columns={partColumns} visibility={visibility} onChange={setVisibility} />
            </div>
          </div>
          <PartsTable
            parts={parts}
            visibility={visibility}
            onVisibilityChange={setVisibility}
            empty={
              filtered ? (
                <EmptyState title="No part matches this search.">Try fewer words, or another category.</EmptyState>
              ) : (
                <EmptyState title="No parts yet.">
                  {canWrite
                    ? 'Add the resistors, capacitors, transistors and other parts your products use, with their ratings: use “New part” above.'
                    : 'Designers add the parts your products use, with their ratings.'}
                </EmptyState>
              )
            }
          />
        </>
      )}
    </>
  );
}
