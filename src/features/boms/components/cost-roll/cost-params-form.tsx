import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../../components/ui/button';

/**
 * The build quantity and costing date a cost roll is worked out for. The date picks the
 * quotes valid that day and the FX rates as of it; empty means today.
 */
export function CostParamsForm({
  qty,
  date,
  plannedQty,
  onApply,
}: {
  qty: number;
  date: string | undefined;
  plannedQty: number;
  onApply: (qty: number, date: string | undefined) => void;
}) {
  const id = useId();
  const [qtyText, setQtyText] = useState(String(qty));
  const [dateText, setDateText] = useState(date ?? '');
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const clean = qtyText.replace(/[,\s]/g, '');
    if (!/^\d+$/.test(clean) || Number(clean) < 1 || Number(clean) > 100_000_000) {
      setError('Quantity must be a whole number of units from 1 to 100,000,000.');
      return;
    }
    setError(null);
    onApply(Number(clean), dateText || undefined);
  };

  return (
    <form onSubmit={submit} aria-label="Cost roll quantity and date" className="flex flex-wrap items-end gap-3">
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-qty`} className="text-sm font-medium">
          Build quantity
        </label>
        <input
          id={`${id}-qty`}
          inputMode="numeric"
          value={qtyText}
          onChange={(e) => setQtyText(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="h-9 w-36 rounded-md border border-rule px-3 text-right text-sm tabular-nums hover:border-muted"
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-date`} className="text-sm font-medium">
          Costing date
        </label>
        <input
          id={`${id}-date`}
          type="date"
          value={dateText}
          onChange={(e) => setDateText(e.target.value)}
          className="h-9 rounded-md border border-rule px-3 text-sm hover:border-muted"
        />
      </div>
      <Button type="submit" variant="secondary">
        Show cost roll
      </Button>
      {qty !== plannedQty || date ? (
        <Button
          variant="quiet"
          onClick={() => {
            setQtyText(String(plannedQty));
            setDateText('');
            setError(null);
            onApply(plannedQty, undefined);
          }}
        >
          Planned quantity, today
        </Button>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="w-full text-sm font-medium text-brick">
          {error}
        </p>
      ) : null}
    </form>
  );
}
