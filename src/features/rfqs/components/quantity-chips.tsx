import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { fieldMessage } from '../../../lib/form-errors';
import { formatCount, parseQuantityList } from '../quantities';

const MAX_QUANTITIES = 8;

/**
 * The build quantities to be quoted at, as chips. Typing "10k / 50k / 100k" and pressing
 * Enter adds three; each chip can be removed. Kept sorted, without repeats.
 */
export function QuantityChips({ value, onChange, error }: { value: number[]; onChange: (next: number[]) => void; error?: string }) {
  const inputId = useId();
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const shown = problem ?? (error ? fieldMessage('Quantities', error) : null);

  const add = () => {
    if (!text.trim()) return;
    const { quantities, rejected } = parseQuantityList(text);
    const next = [...new Set([...value, ...quantities])].sort((a, b) => a - b);
    if (next.length > MAX_QUANTITIES) {
      setProblem(`At most ${MAX_QUANTITIES} quantities per request.`);
      return;
    }
    onChange(next);
    setText(rejected.join(' / '));
    setProblem(rejected.length ? `${rejected.map((r) => `“${r}”`).join(', ')} ${rejected.length === 1 ? 'is' : 'are'} not a whole number of pieces.` : null);
  };

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className="text-sm font-medium text-ink">
        Quantities (pcs)
      </label>
      <div className={`flex flex-wrap items-center gap-1.5 rounded-md border bg-surface p-1.5 ${shown ? 'border-brick' : 'border-rule'}`}>
        <ul aria-label="Quantities" className="flex flex-wrap gap-1.5 empty:hidden">
          {value.map((qty) => (
            <li key={qty} className="inline-flex h-7 items-center gap-1 rounded border border-copper/40 bg-copper/10 pr-0.5 pl-2 text-sm text-copper-dark tabular-nums">
              {formatCount(qty)}
              <button
                type="button"
                aria-label={`Remove ${formatCount(qty)}`}
                onClick={() => onChange(value.filter((q) => q !== qty))}
                className="rounded px-1 text-base leading-none hover:bg-copper/20"
              >
                <span aria-hidden="true">×</span>
              </button>
            </li>
          ))}
        </ul>
        <input
          id={inputId}
          value={text}
          onChange={(event) => setText(event.target.value)}
          onKeyDown={(event) => {
            if (event.key === 'Enter' || (event.key === ',' && !/\d$/.test(text))) {
              event.preventDefault();
              add();
            } else if (event.key === 'Backspace' && !text && value.length) {
              onChange(value.slice(0, -1));
            }
          }}
          onBlur={add}
          placeholder={value.length ? 'Add another' : '10k / 50k / 100k'}
          aria-invalid={shown ? true : undefined}
          aria-describedby={`${inputId}-hint${shown ? ` ${inputId}-error` : ''}`}
          className="h-7 min-w-32 flex-1 border-0 bg-transparent px-1 text-sm outline-none placeholder:text-muted/70"
        />
        <Button size="sm" variant="secondary" onClick={add}>
          Add
        </Button>
      </div>
      <p id={`${inputId}-hint`} className="text-xs text-muted">
        Up to {MAX_QUANTITIES}. Write them as you would say them: 10k, 50k, 100k or 10,000. Suppliers price each one.
      </p>
      {shown ? (
        <p id={`${inputId}-error`} className="text-xs font-medium text-brick">
          {shown}
        </p>
      ) : null}
    </div>
  );
}
