import { useId, useState } from 'react';
import { progressPercent, type UploadProgress } from '../../../lib/upload';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../components/ui/error-state';
import { Dialog } from '../../../components/ui/dialog';
import { FormAlert } from '../../../components/ui/form-alert';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { SelectField } from '../../../components/ui/select-field';
import { Tag } from '../../../components/ui/tag';
import type { ImportPreview } from '../api';
import { useImportLines } from '../hooks';

type Mapping = Record<string, string | null>;

/**
 * Lines from a spreadsheet, in four steps: choose the file, watch it upload, say which
 * column holds what, check the preview (per-row problems, matched and unresolved rows),
 * then import every row in one go — or none, if any row has a problem.
 */
export function ImportDialog({ bomId, open, onClose, onImported }: { bomId: string; open: boolean; onClose: () => void; onImported: (count: number) => void }) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      size="xl"
      title="Import lines"
      description="A CSV or XLSX file with a header row. Rows are matched to library parts by MPN or internal PN; rows that match none come in as unresolved lines to resolve in the grid."
    >
      <ImportSteps bomId={bomId} onClose={onClose} onImported={onImported} />
    </Dialog>
  );
}

function ImportSteps({ bomId, onClose, onImported }: { bomId: string; onClose: () => void; onImported: (count: number) => void }) {
  const importLines = useImportLines(bomId);
  const fileId = useId();
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [mapping, setMapping] = useState<Mapping | null>(null);
  const [error, setError] = useState<string | null>(null);
  const busy = importLines.isPending;

  const run = (chosen: File, withMapping: Mapping | null, commit: boolean) => {
    setError(null);
    setProgress({ loaded: 0, total: chosen.size || null });
    importLines.mutate(
      { file: chosen, mapping: withMapping ?? undefined, commit, onProgress: setProgress },
      {
        onSuccess: (result) => {
          setProgress(null);
          if (commit) {
            onImported(result.imported ?? result.totalRows);
            onClose();
            return;
          }
          setPreview(result);
          setMapping(result.mapping);
        },
        onError: (e) => {
          setProgress(null);
          setError(describeError(e));
        },
      },
    );
  };

  const columnOptions = [{ value: '', label: 'Not in this file' }, ...(preview?.columns ?? []).map((c) => ({ value: c, label: c }))];
  const mappedFields = preview ? preview.fields.filter((f) => mapping?.[f.name]) : [];
  const blocked = !preview || preview.mappingProblems.length > 0 || preview.problemRows > 0 || preview.totalRows === 0;

  return (
    <div className="flex flex-col gap-5">
      {error ? <FormAlert>{error}</FormAlert> : null}

      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={fileId} className="text-sm font-medium">
            Spreadsheet file (CSV or XLSX)
          </label>
          <input
            id={fileId}
            type="file"
            accept=".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
            disabled={busy}
            className="text-sm file:mr-3 file:h-9 file:rounded-md file:border file:border-rule file:bg-surface file:px-3 file:text-sm file:font-medium"
            onChange={(event) => {
              const chosen = event.target.files?.[0] ?? null;
              setFile(chosen);
              setPreview(null);
              setMapping(null);
              if (chosen) run(chosen, null, false);
            }}
          />
        </div>
      </div>

      {progress ? <ProgressBar label={`Uploading ${file?.name ?? 'the file'}`} percent={progressPercent(progress)} /> : null}

      {preview && mapping && file ? (
        <>
          <fieldset className="flex flex-col gap-3">
            <legend className="text-base font-semibold">Columns</legend>
            <p className="text-sm text-muted">Which column of the file holds each field. Quantity per unit and one of MPN, internal PN or description are needed.</p>
            <div className="grid gap-3 sm:grid-cols-4">
              {preview.fields.map((field) => (
                <SelectField
                  key={field.name}
                  label={`${field.label}${field.required ? ' (required)' : ''}`}
                  options={columnOptions}
                  value={mapping[field.name] ?? ''}
                  disabled={busy}
                  onChange={(event) => {
                    const next = { ...mapping, [field.name]: event.target.value || null };
                    setMapping(next);
                    run(file, next, false);
                  }}
                />
              ))}
            </div>
            {preview.mappingProblems.length ? (
              <FormAlert>
                {preview.mappingProblems.map((p) => p.message.charAt(0).toUpperCase() + p.message.slice(1)).join('. ')}.
              </FormAlert>
            ) : null}
          </fieldset>

          <section aria-labelledby={`${fileId}-preview`} className="flex flex-col gap-3">
            <h3 id={`${fileId}-preview`} className="text-base font-semibold">
              Preview
            </h3>
            <ul className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
              <li>
                <span className="font-semibold tabular-nums">{preview.totalRows}</span> rows
              </li>
              <li>
                <span className="font-semibold tabular-nums">{preview.matchedRows}</span> matched to a part
              </li>
              <li>
                <span className="font-semibold tabular-nums">{preview.unresolvedRows}</span> unresolved
              </li>
              <li className={preview.problemRows ? 'font-medium text-brick' : ''}>
                <span className="font-semibold tabular-nums">{preview.problemRows}</span> with problems
              </li>
            </ul>
            {preview.problemRows ? (
              <FormAlert>Fix the rows with problems in the file (or choose other columns): nothing is imported while any row has one.</FormAlert>
            ) : null}
            {preview.rows.length ? (
              <div className="max-h-80 overflow-auto rounded-lg border border-rule">
                <table aria-label="Import preview" className="w-full border-collapse text-sm">
                  <thead className="sticky top-0 bg-surface">
                    <tr>
                      <th scope="col" className="border-b border-rule px-2 py-1.5 text-right text-xs font-semibold text-muted uppercase">
                        Row
                      </th>
                      {mappedFields.map((f) => (
                        <th key={f.name} scope="col" className="border-b border-rule px-2 py-1.5 text-left text-xs font-semibold text-muted uppercase">
                          {f.label}
                        </th>
                      ))}
                      <th scope="col" className="border-b border-rule px-2 py-1.5 text-left text-xs font-semibold text-muted uppercase">
                        Part
                      </th>
                      <th scope="col" className="border-b border-rule px-2 py-1.5 text-left text-xs font-semibold text-muted uppercase">
                        Problems and warnings
                      </th>
                    </tr>
                  </thead>
                  <tbody>
                    {preview.rows.map((row) => (
                      <tr key={row.row} className={`border-b border-rule/60 ${row.problems.length ? 'bg-brick/5' : ''}`}>
                        <td className="num px-2 py-1 text-muted">{row.row}</td>
                        {mappedFields.map((f) => (
                          <td key={f.name} className="max-w-48 truncate px-2 py-1">
                            {row.values[f.name] ?? ''}
                          </td>
                        ))}
                        <td className="px-2 py-1">
                          {row.matched ? <Tag tone="ok">{row.matched === 'mpn' ? 'Matched by MPN' : 'Matched by internal PN'}</Tag> : <Tag tone="warning">Unresolved</Tag>}
                        </td>
                        <td className="px-2 py-1">
                          {row.problems.map((p) => (
                            <p key={p.field} className="font-medium text-brick">
                              {p.field}: {p.message}
                            </p>
                          ))}
                          {row.warnings.map((w) => (
                            <p key={w} className="text-copper-dark">
                              {w}
                            </p>
                          ))}
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            ) : null}
            {preview.totalRows > preview.rows.length ? (
              <p className="text-xs text-muted">The preview shows the first {preview.rows.length} rows; the counts cover all {preview.totalRows}.</p>
            ) : null}
          </section>
        </>
      ) : null}

      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onClose} disabled={busy}>
          Cancel
        </Button>
        {preview && file ? (
          <Button disabled={blocked} pending={busy} onClick={() => run(file, mapping, true)}>
            Import {preview.totalRows} line{preview.totalRows === 1 ? '' : 's'}
          </Button>
        ) : null}
      </div>
    </div>
  );
}
