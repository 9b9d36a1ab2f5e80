import { useId, useMemo, useRef, useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { SelectField } from '../../../components/ui/select-field';
import { describeError } from '../../../components/ui/error-state';
import { isApiError } from '../../../lib/api-client';
import { progressPercent, type UploadProgress } from '../../../lib/upload';
import { QUOTE_IMPORT_MAX_MB, QUOTE_TEMPLATE_URL, type ImportPreview } from '../api';
import { useCommitQuoteImport, usePreviewQuoteImport } from '../hooks';
import {
  columnsUsedTwice,
  commitProblems,
  initialMapping,
  mappingForRequest,
  mappingGaps,
  mappingKey,
  mappingProblemsByField,
  type MappingState,
} from '../mapping';
import { PreviewTable } from './preview-table';

export type ImportSupplier = { id: string; name: string };

const countFormat = new Intl.NumberFormat('en-GB');

function Step({ n, title, children }: { n: number; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={`import-step-${n}`} className="flex flex-col gap-3">
      <h3 id={`import-step-${n}`} className="flex items-center gap-2 text-base font-semibold">
        <span aria-hidden="true" className="inline-flex size-6 items-center justify-center rounded-full border border-copper text-xs text-copper-dark">
          {n}
        </span>
        {title}
      </h3>
      {children}
    </section>
  );
}

/**
 * Quote import in three steps: choose the file and upload it (with progress), match its
 * columns to our fields, check the rows and import them all at once. The server reads
 * the file again at every step and keeps nothing until the import itself.
 */
export function QuoteImport({
  suppliers,
  defaultSupplierId = '',
  onImported,
}: {
  suppliers: readonly ImportSupplier[];
  /** Preselects "one supplier for the whole file" (opened from a supplier's page). */
  defaultSupplierId?: string;
  onImported?: (count: number) => void;
}) {
  const fileInputId = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [mapping, setMapping] = useState<MappingState | null>(null);
  const [checkedKey, setCheckedKey] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<string[]>([]);
  const [imported, setImported] = useState<number | null>(null);
  const previewImport = usePreviewQuoteImport();
  const commitImport = useCommitQuoteImport();

  const fields = preview?.fields ?? [];
  const gaps = mapping ? mappingGaps(mapping, fields) : {};
  const serverGaps = preview ? mappingProblemsByField(preview.mappingProblems) : {};
  const twice = mapping ? columnsUsedTwice(mapping) : [];
  const upToDate = mapping !== null && checkedKey === mappingKey(mapping);
  const canCommit =
    preview !== null && upToDate && preview.mappingProblems.length === 0 && preview.problemRows === 0 && preview.quotes > 0 && !commitImport.isPending;
  const supplierOptions = useMemo(
    () => [{ value: '', label: 'Read it from a column of the file' }, ...suppliers.map((s) => ({ value: s.id, label: s.name }))],
    [suppliers],
  );

  const send = (state: MappingState | null) => {
    if (!file) {
      setProblem('Choose a CSV or XLSX file first.');
      return;
    }
    setProblem(null);
    setRefusal([]);
    setProgress({ loaded: 0, total: file.size });
    previewImport.mutate(
      {
        file,
        mapping: state && preview ? mappingForRequest(state, preview.fields) : undefined,
        supplierId: state ? state.supplierId : defaultSupplierId,
        onProgress: setProgress,
      },
      {
        onSuccess: (answer) => {
          setPreview(answer);
          const next = state ?? initialMapping(answer, defaultSupplierId);
          setMapping(next);
          setCheckedKey(mappingKey(next));
        },
        onError: (error) => setProblem(describeError(error)),
        onSettled: () => setProgress(null),
      },
    );
  };

  const commit = () => {
    if (!file || !mapping || !preview) return;
    setProblem(null);
    setRefusal([]);
    setProgress({ loaded: 0, total: file.size });
    commitImport.mutate(
      { file, mapping: mappingForRequest(mapping, preview.fields), supplierId: mapping.supplierId, onProgress: setProgress },
      {
        onSuccess: (answer) => {
          const count = answer.imported ?? answer.quotes;
          setImported(count);
          onImported?.(count);
        },
        onError: (error) => {
          setProblem(describeError(error));
          if (isApiError(error)) setRefusal(commitProblems(error.details, preview.fields));
        },
        onSettled: () => setProgress(null),
      },
    );
  };

  const restart = () => {
    setFile(null);
    setPreview(null);
    setMapping(null);
    setCheckedKey(null);
    setImported(null);
    setProblem(null);
    setRefusal([]);
    if (fileRef.current) fileRef.current.value = '';
  };

  if (imported !== null) {
    return (
      <div className="flex flex-col gap-4">
        <FormAlert tone="success">
          Imported {countFormat.format(imported)} {imported === 1 ? 'quote' : 'quotes'} from {file?.name}. They show on each part&apos;s page and on the
          quote board.
        </FormAlert>
        <div>
          <Button variant="secondary" onClick={restart}>
            Import another file
          </Button>
        </div>
      </div>
    );
  }

  const busy = previewImport.isPending || commitImport.isPending;

  return (
    <div className="flex flex-col gap-6">
      {problem ? (
        <FormAlert>
          {problem}
          {refusal.length ? (
            <ul className="mt-1 list-disc pl-5">
              {refusal.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          ) : null}
        </FormAlert>
      ) : null}

      <Step n={1} title="Choose the file">
        <form
          noValidate
          aria-label="Choose a quote file"
          className="flex flex-wrap items-end gap-3"
          onSubmit={(event) => {
            event.preventDefault();
            setPreview(null);
            setMapping(null);
            send(null);
          }}
        >
          <div className="flex flex-col gap-1">
            <label htmlFor={fileInputId} className="text-sm font-medium">
              Price list (CSV or XLSX)
            </label>
            <input
              ref={fileRef}
              id={fileInputId}
              type="file"
              accept=".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
              aria-describedby={`${fileInputId}-hint`}
              onChange={(event) => {
                setFile(event.target.files?.[0] ?? null);
                setPreview(null);
                setMapping(null);
              }}
              className="text-sm file:mr-3 file:h-9 file:rounded-md file:border file:border-rule file:bg-surface file:px-3 file:text-sm file:font-medium"
            />
            <p id={`${fileInputId}-hint`} className="text-xs text-muted">
              One row per price break, up to {QUOTE_IMPORT_MAX_MB} MB.{' '}
              <a href={QUOTE_TEMPLATE_URL} download className="font-medium text-copper-dark underline">
                Download the template
              </a>{' '}
              to see the columns we read.
            </p>
          </div>
          <Button type="submit" variant={preview ? 'secondary' : 'primary'} pending={previewImport.isPending && !preview}>
            Upload
          </Button>
        </form>
        {busy && progress ? <ProgressBar label={`Sending ${file?.name ?? 'the file'}`} percent={progressPercent(progress)} /> : null}
      </Step>

      {preview && mapping ? (
        <Step n={2} title="Match the columns">
          <p className="text-sm text-muted">
            We suggested a column for each field from the file&apos;s header. Change any that are wrong; leave a field on “Not in this file” when the file has no
            such column.
          </p>
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {preview.fields.map((field) => (
              <SelectField
                key={field.name}
                label={field.required ? `${field.label} (required)` : field.label}
                value={mapping.columns[field.name] ?? ''}
                error={gaps[field.name] ?? serverGaps[field.name]}
                options={[{ value: '', label: 'Not in this file' }, ...preview.columns.map((c) => ({ value: c, label: c }))]}
                onChange={(event) => setMapping({ ...mapping, columns: { ...mapping.columns, [field.name]: event.target.value } })}
              />
            ))}
            <SelectField
              label="One supplier for the whole file"
              value={mapping.supplierId}
              options={supplierOptions}
              error={serverGaps.supplierId}
              onChange={(event) => setMapping({ ...mapping, supplierId: event.target.value })}
            />
          </div>
          {twice.length ? (
            <FormAlert tone="info">The column {twice.map((c) => `“${c}”`).join(', ')} is chosen for more than one field. Check that this is meant.</FormAlert>
          ) : null}
          <div className="flex items-center gap-3">
            <Button variant={upToDate ? 'secondary' : 'primary'} onClick={() => send(mapping)} pending={previewImport.isPending} disabled={Object.keys(gaps).length > 0}>
              Check rows
            </Button>
            {!upToDate ? <span className="text-sm text-muted">The mapping changed: check the rows again before importing.</span> : null}
          </div>
        </Step>
      ) : null}

      {preview && mapping && preview.mappingProblems.length === 0 ? (
        <Step n={3} title="Check the rows and import">
          <p className="text-sm" role="status">
            {countFormat.format(preview.totalRows)} {preview.totalRows === 1 ? 'row' : 'rows'}: {countFormat.format(preview.validRows)} ready,{' '}
            <span className={preview.problemRows ? 'font-medium text-brick' : ''}>
              {countFormat.format(preview.problemRows)} with problems
            </span>
            . The ready rows make {countFormat.format(preview.quotes)} {preview.quotes === 1 ? 'quote' : 'quotes'}.
            {preview.totalRows > preview.rows.length ? ` The first ${countFormat.format(preview.rows.length)} rows are shown.` : ''}
          </p>
          {preview.problemRows ? (
            <p className="text-sm text-muted">Fix the rows marked below in the file (or the mapping), then upload it again: an import takes every row or none.</p>
          ) : null}
          <PreviewTable rows={preview.rows} fields={preview.fields} mapping={preview.mapping} />
          <div>
            <Button onClick={commit} disabled={!canCommit} pending={commitImport.isPending}>
              {`Import ${preview.quotes} quotes`}
            </Button>
          </div>
        </Step>
      ) : null}
    </div>
  );
}
