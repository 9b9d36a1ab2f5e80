import { useId, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { describeError } from '../../../components/ui/error-state';
import { isApiError } from '../../../lib/api-client';
import { progressPercent, type UploadProgress } from '../../../lib/upload';
import { useImportFxRates } from '../hooks';

/** The feed's upload limit on the server, said beside the file box. */
const FX_IMPORT_MAX_MB = 5;

/**
 * Imports a daily reference-rate feed against EUR: `date,currency,rate` rows, or the
 * wide form with a `Date` column and one column per currency. All rows or none; the
 * refusal lists each bad row.
 */
export function FxImportForm() {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [result, setResult] = useState<{ tone: 'success' | 'error'; message: string; lines: string[] } | null>(null);
  const importRates = useImportFxRates(setProgress);

  return (
    <form
      noValidate
      aria-label="Import rates from a file"
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        setResult(null);
        if (!file) {
          setResult({ tone: 'error', message: 'Choose a CSV file first.', lines: [] });
          return;
        }
        setProgress({ loaded: 0, total: file.size });
        importRates.mutate(file, {
          onSuccess: ({ imported }) => {
            setResult({ tone: 'success', message: `Imported ${imported} ${imported === 1 ? 'rate' : 'rates'} from ${file.name}.`, lines: [] });
            setFile(null);
            if (inputRef.current) inputRef.current.value = '';
          },
          onError: (error) =>
            setResult({
              tone: 'error',
              message: describeError(error),
              lines: isApiError(error) ? error.details.map((d) => (d.path ? `${d.path.replace(/^row /, 'Row ')}: ${d.message}` : d.message)) : [],
            }),
          onSettled: () => setProgress(null),
        });
      }}
    >
      {result ? (
        <FormAlert tone={result.tone}>
          {result.message}
          {result.lines.length ? (
            <ul aria-label="Rows with problems" className="mt-1 list-disc pl-5">
              {result.lines.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          ) : null}
        </FormAlert>
      ) : null}
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={inputId} className="text-sm font-medium">
            Feed file (CSV)
          </label>
          <input
            ref={inputRef}
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            aria-describedby={`${inputId}-hint`}
            onChange={(event) => setFile(event.target.files?.[0] ?? null)}
            className="text-sm file:mr-3 file:h-9 file:rounded-md file:border file:border-rule file:bg-surface file:px-3 file:text-sm file:font-medium"
          />
          <p id={`${inputId}-hint`} className="max-w-prose text-xs text-muted">
            Rates against EUR, up to {FX_IMPORT_MAX_MB} MB: rows of <code>date,currency,rate</code>, or a <code>Date</code> column followed by one column per
            currency (<code>Date,USD,JPY,…</code>). Rows already held for the same date and pair are replaced.
          </p>
        </div>
        <Button type="submit" variant="secondary" pending={importRates.isPending}>
          Import rates
        </Button>
      </div>
      {importRates.isPending ? <ProgressBar label={`Sending ${file?.name ?? 'the file'}`} percent={progressPercent(progress)} /> : null}
    </form>
  );
}
