import { useEffect, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { keepPreviousData, useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { CurrencyField } from '../../../components/ui/currency-field';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { PageHeader } from '../../../components/ui/page-header';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { formatDate } from '../../../lib/format';
import { trimDecimal } from '../../../lib/money';
import { partLabel, partQueryOptions, partSearchQueryOptions } from '../../../features/parts/api';
import { ratingSummary } from '../../../features/parts/ratings';
import { offersQueryOptions, type BoardParams } from '../../../features/quotes/api';
import { OffersTable } from '../../../features/quotes/components/offers-table';
import { profilesQueryOptions } from '../../../features/profiles/api';

const DEFAULT_QTY = 10000;
const countFormat = new Intl.NumberFormat('en-GB');

export const quoteBoardLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(profilesQueryOptions());
  return null;
};

/** The board's inputs from the address; a quantity that is not a whole number of pieces is reported, not guessed. */
function boardInputs(params: URLSearchParams): { partId: string; qtyText: string; qty: number | null; board: Omit<BoardParams, 'qty'> } {
  const qtyText = params.get('qty') ?? String(DEFAULT_QTY);
  const compact = qtyText.replace(/[,\s_]/g, '');
  const qty = /^\d{1,9}$/.test(compact) && Number(compact) >= 1 ? Number(compact) : null;
  return {
    partId: params.get('part') ?? '',
    qtyText,
    qty,
    board: {
      currency: params.get('currency')?.toUpperCase() || undefined,
      profileId: params.get('profileId') || undefined,
      date: params.get('date') || undefined,
    },
  };
}

/** Updates some parameters of the address, keeping the others; empty values are dropped. */
function useSetParams() {
  const [, setSearchParams] = useSearchParams();
  return (changes: Record<string, string>) =>
    setSearchParams(
      (next) => {
        for (const [key, value] of Object.entries(changes)) {
          if (value) next.set(key, value);
          else next.delete(key);
        }
        return next;
      },
      { replace: true },
    );
}

/** A text box that writes the address once typing pauses. */
function useUrlText(value: string, write: (text: string) => void, delay = 400): [string, (text: string) => void] {
  const [text, setText] = useState(value);
  const settled = useDebouncedValue(text, delay);
  useEffect(() => {
    if (settled !== value) write(settled);
    // `write` is a fresh function each render; the settled text is what matters.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [settled]);
  return [text, setText];
}

function PartPicker() {
  const setParams = useSetParams();
  const [find, setFind] = useState('');
  const q = useDebouncedValue(find, 300);
  const results = useQuery({ ...partSearchQueryOptions(q), placeholderData: keepPreviousData });

  return (
    <section aria-labelledby="pick-part" className="flex flex-col gap-3">
      <h2 id="pick-part" className="text-lg font-semibold">
        Choose a part
      </h2>
      <TextField
        label="Find a part"
        type="search"
        value={find}
        onChange={(event) => setFind(event.target.value)}
        placeholder="10k 0603"
        hint="Search in the trade's words: a value, a package, an MPN."
        className="max-w-md"
      />
      {results.isPending ? (
        <LoadingState label="Searching parts…" />
      ) : results.isError ? (
        <ErrorState title="The parts could not be searched" error={results.error} onRetry={() => void results.refetch()} />
      ) : results.data.length === 0 ? (
        <EmptyState title={q ? 'No part matches this search.' : 'No parts yet.'}>
          {q ? 'Try fewer words.' : <>Add parts in <Link to="/parts" className="underline">Parts</Link> first.</>}
        </EmptyState>
      ) : (
        <ul aria-label="Matching parts" className="divide-y divide-rule rounded-lg border border-rule bg-surface">
          {results.data.map((part) => (
            <li key={part.id} className="flex items-center justify-between gap-3 px-4 py-2 text-sm">
              <span>
                <span className="font-medium">{partLabel(part)}</span>
                <span className="ml-2 text-muted tabular-nums">{[part.package, ratingSummary(part.category, part.ratings)].filter(Boolean).join(' · ')}</span>
              </span>
              <Button size="sm" variant="secondary" aria-label={`Show offers for ${part.internalPn}`} onClick={() => setParams({ part: part.id })}>
                Show offers
              </Button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function ChosenPart({ partId }: { partId: string }) {
  const setParams = useSetParams();
  const part = useQuery(partQueryOptions(partId));
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-lg border border-rule bg-surface px-4 py-3 text-sm">
      <span className="text-muted">Part</span>
      {part.isPending ? (
        <span className="text-muted">Loading…</span>
      ) : part.isError ? (
        <span className="text-brick">This part could not be loaded.</span>
      ) : (
        <Link to={`/parts/${part.data.id}`} className="font-medium text-copper-dark underline-offset-2 hover:underline">
          {partLabel(part.data)}
        </Link>
      )}
      {part.data ? (
        <span className="text-muted tabular-nums">
          {[part.data.package, ratingSummary(part.data.category, part.data.ratings), part.data.hsCode ? `HS ${part.data.hsCode}` : 'no HS code'].filter(Boolean).join(' · ')}
        </span>
      ) : null}
      <Button size="sm" variant="quiet" className="ml-auto" onClick={() => setParams({ part: '' })}>
        Change part
      </Button>
    </div>
  );
}

export function QuoteBoardRoute() {
  const [params] = useSearchParams();
  const setParams = useSetParams();
  const { partId, qtyText, qty, board } = boardInputs(params);
  const { data: profiles } = useSuspenseQuery(profilesQueryOptions());
  const [qtyInput, setQtyInput] = useUrlText(qtyText, (text) => setParams({ qty: text }));
  const [currencyInput, setCurrencyInput] = useUrlText(board.currency ?? '', (text) => setParams({ currency: text.trim().toUpperCase() }));
  const currencyOk = !board.currency || /^[A-Z]{3}$/.test(board.currency);

  const offers = useQuery({
    ...offersQueryOptions(partId, { qty: qty ?? 1, ...board }),
    enabled: Boolean(partId) && qty !== null && currencyOk,
    placeholderData: keepPreviousData,
  });

  const profileOptions = [
    { value: '', label: profiles.length ? `Default (${profiles[0]?.name})` : 'No profile: no adders, no duty' },
    ...profiles.map((p) => ({ value: p.id, label: `${p.name} (${p.currency}, ${p.dutyBasis})` })),
  ];

  return (
    <>
      <PageHeader
        title="Quote board"
        description="Every offer for one part side by side at the quantity you need, in landed cost per piece."
      />
      <div className="flex flex-col gap-6">
        {partId ? <ChosenPart partId={partId} /> : <PartPicker />}

        <form
          aria-label="Board settings"
          className="flex flex-wrap items-start gap-3"
          onSubmit={(event) => event.preventDefault()}
          noValidate
        >
          <TextField
            label="Quantity needed (pcs)"
            inputMode="numeric"
            value={qtyInput}
            onChange={(event) => setQtyInput(event.target.value)}
            error={qty === null ? 'must be a whole number of pieces from 1' : undefined}
            className="w-44"
          />
          <CurrencyField
            label="Currency"
            value={currencyInput}
            onChange={(event) => setCurrencyInput(event.target.value)}
            placeholder={offers.data?.currency ?? 'USD'}
            hint="Empty: the profile's."
            error={currencyOk ? undefined : 'must be an ISO 4217 code such as USD'}
          />
          <SelectField label="Landed-cost profile" options={profileOptions} value={board.profileId ?? ''} onChange={(event) => setParams({ profileId: event.target.value })} />
          <TextField
            label="Costing date"
            type="date"
            value={board.date ?? ''}
            onChange={(event) => setParams({ date: event.target.value })}
            hint="Empty: today."
          />
        </form>

        {!partId ? null : offers.isPending && offers.fetchStatus !== 'idle' ? (
          <LoadingState label="Pricing the offers…" />
        ) : offers.isError ? (
          <ErrorState title="The offers could not be priced" error={offers.error} onRetry={() => void offers.refetch()} />
        ) : offers.data ? (
          <section aria-labelledby="offers-title" className="flex flex-col gap-3">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="offers-title" className="text-lg font-semibold">
                Offers
              </h2>
              <p className="text-sm text-muted tabular-nums" aria-live="polite">
                {countFormat.format(offers.data.qty)} pcs on {formatDate(offers.data.date)}, in {offers.data.currency},{' '}
                {offers.data.profileName ? `profile “${offers.data.profileName}”` : 'no profile'}, duty {trimDecimal(offers.data.dutyPct)} %
                {offers.isFetching ? ' · updating…' : ''}
              </p>
            </div>
            <OffersTable board={offers.data} />
            <p className="max-w-prose text-xs text-muted">
              Landed per piece is the landed cost of the whole order divided by the pieces needed, so any pieces bought over the need are paid for. The board
              applies the profile&apos;s percentage adders and duty; per-shipment freight and fees are shared out in a BOM&apos;s cost roll. An offer without an
              FX rate is never converted at 1.
            </p>
          </section>
        ) : null}
      </div>
    </>
  );
}
