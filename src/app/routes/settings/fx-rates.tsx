import { useEffect, useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { CurrencyField } from '../../../components/ui/currency-field';
import { PageHeader } from '../../../components/ui/page-header';
import { TextField } from '../../../components/ui/text-field';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useSession } from '../../../features/auth/session-context';
import { FX_LIST_LIMIT, fxRatesQueryOptions, type FxFilters } from '../../../features/fx/api';
import { FxImportForm } from '../../../features/fx/components/fx-import-form';
import { FxRateForm } from '../../../features/fx/components/fx-rate-form';
import { FxRatesTable, NoFxRates } from '../../../features/fx/components/fx-rates-table';

const isoDate = /^\d{4}-\d{2}-\d{2}$/;
const countFormat = new Intl.NumberFormat('en-GB');

/** The filters in the address; a malformed one is left out rather than sent. */
function fxFilters(params: URLSearchParams): FxFilters {
  const from = params.get('from') ?? '';
  const to = params.get('to') ?? '';
  const currency = (params.get('currency') ?? '').toUpperCase();
  return {
    from: isoDate.test(from) ? from : undefined,
    to: isoDate.test(to) ? to : undefined,
    currency: /^[A-Z]{3}$/.test(currency) ? currency : undefined,
  };
}

export const fxRatesLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(fxRatesQueryOptions(fxFilters(new URL(request.url).searchParams)));
    return null;
  };

function FxFiltersForm() {
  const [params, setParams] = useSearchParams();
  const set = (key: string, value: string) =>
    setParams(
      (next) => {
        if (value) next.set(key, value);
        else next.delete(key);
        return next;
      },
      { replace: true },
    );
  const urlCurrency = params.get('currency') ?? '';
  const [currency, setCurrency] = useState(urlCurrency);
  const settled = useDebouncedValue(currency, 350);
  useEffect(() => {
    const wanted = settled.trim().toUpperCase();
    if (wanted !== urlCurrency && (wanted === '' || wanted.length === 3)) {
      setParams(
        (next) => {
          if (wanted) next.set('currency', wanted);
          else next.delete('currency');
          return next;
        },
        { replace: true },
      );
    }
  }, [settled, urlCurrency, setParams]);

  return (
    <form aria-label="Filter rates" noValidate className="flex flex-wrap items-start gap-3" onSubmit={(event) => event.preventDefault()}>
      <TextField label="From" type="date" value={params.get('from') ?? ''} onChange={(event) => set('from', event.target.value)} />
      <TextField label="To" type="date" value={params.get('to') ?? ''} onChange={(event) => set('to', event.target.value)} />
      <CurrencyField label="Currency" hint="As base or quote." value={currency} onChange={(event) => setCurrency(event.target.value)} />
      {params.get('from') || params.get('to') || urlCurrency ? (
        <Button
          variant="quiet"
          className="mt-6"
          onClick={() => {
            setCurrency('');
            setParams(
              (next) => {
                for (const key of ['from', 'to', 'currency']) next.delete(key);
                return next;
              },
              { replace: true },
            );
          }}
        >
          Clear filters
        </Button>
      ) : null}
    </form>
  );
}

export function FxRatesRoute() {
  const session = useSession();
  const [params] = useSearchParams();
  const filters = fxFilters(params);
  const { data: rates } = useSuspenseQuery(fxRatesQueryOptions(filters));
  const canWrite = can(session.role, 'fx.write');
  const filtered = Boolean(filters.from || filters.to || filters.currency);

  return (
    <>
      <PageHeader
        title="FX rates"
        description="A row means 1 base = rate quote on that date; a missing rate is never assumed to be 1 — an offer or line without one is left out and says so."
      />
      <div className="flex flex-col gap-8">
        {canWrite ? (
          <div className="grid gap-8 lg:grid-cols-2">
            <section aria-labelledby="fx-enter" className="flex flex-col gap-3">
              <h2 id="fx-enter" className="text-lg font-semibold">
                Enter a rate
              </h2>
              <FxRateForm />
            </section>
            <section aria-labelledby="fx-import" className="flex flex-col gap-3">
              <h2 id="fx-import" className="text-lg font-semibold">
                Import a reference-rate feed
              </h2>
              <FxImportForm />
            </section>
          </div>
        ) : null}
        <section aria-labelledby="fx-list" className="flex flex-col gap-3">
          <h2 id="fx-list" className="text-lg font-semibold">
            Rates
          </h2>
          <FxFiltersForm />
          <p className="text-sm text-muted tabular-nums" role="status">
            {countFormat.format(rates.length)} {rates.length === 1 ? 'rate' : 'rates'}, newest first
            {rates.length >= FX_LIST_LIMIT ? ` (the newest ${countFormat.format(FX_LIST_LIMIT)}; narrow the dates to see older ones)` : ''}.
          </p>
          <FxRatesTable rates={rates} canWrite={canWrite} empty={<NoFxRates filtered={filtered} canWrite={canWrite} />} />
        </section>
      </div>
    </>
  );
}
