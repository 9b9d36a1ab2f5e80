import { useId, useRef, useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { describeError } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { ProgressBar } from '../../../components/ui/progress-bar';
import { formatDate } from '../../../lib/format';
import { progressPercent, type UploadProgress } from '../../../lib/upload';
import { partFilesQueryOptions, type PartFile } from '../api';
import { useRemoveDatasheet, useUploadDatasheet } from '../hooks';

/**
 * The upload limit the server applies to a datasheet. It is checked here first only to
 * spare a long upload that would be refused; the server's answer is what counts.
 */
export const DATASHEET_MAX_MB = 10;

function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

function UploadDatasheet({ partId }: { partId: string }) {
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const inputRef = useRef<HTMLInputElement>(null);
  const upload = useUploadDatasheet(partId, setProgress);
  const inputId = useId();

  return (
    <form
      noValidate
      aria-label="Upload a datasheet"
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        setProblem(null);
        setDone(null);
        if (!file) {
          setProblem('Choose a PDF file first.');
          return;
        }
        if (file.size > DATASHEET_MAX_MB * 1024 * 1024) {
          setProblem(`${file.name} is ${formatSize(file.size)}; datasheets are limited to ${DATASHEET_MAX_MB} MB.`);
          return;
        }
        setProgress({ loaded: 0, total: file.size });
        upload.mutate(file, {
          onSuccess: (saved) => {
            setDone(`${saved.filename} is attached.`);
            setFile(null);
            if (inputRef.current) inputRef.current.value = '';
          },
          onError: (error) => setProblem(describeError(error)),
          onSettled: () => setProgress(null),
        });
      }}
    >
      {problem ? <FormAlert>{problem}</FormAlert> : null}
      {done ? <FormAlert tone="success">{done}</FormAlert> : null}
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={inputId} className="text-sm font-medium">
            Datasheet (PDF)
          </label>
          <input
            ref={inputRef}
            id={inputId}
            type="file"
            accept="application/pdf,.pdf"
            aria-describedby={`${inputId}-hint`}
            onChange={(event) => setFile(event.target.files?.[0] ?? null)}
            className="text-sm file:mr-3 file:h-9 file:rounded-md file:border file:border-rule file:bg-surface file:px-3 file:text-sm file:font-medium"
          />
          <p id={`${inputId}-hint`} className="text-xs text-muted">
            PDF only, up to {DATASHEET_MAX_MB} MB. The file is judged by its content, not its name.
          </p>
        </div>
        <Button type="submit" variant="secondary" pending={upload.isPending}>
          Upload
        </Button>
      </div>
      {upload.isPending ? <ProgressBar label={`Uploading ${file?.name ?? 'the datasheet'}`} percent={progressPercent(progress)} /> : null}
    </form>
  );
}

/** A part's datasheets: download any; designers and owners attach and remove them. */
export function Datasheets({ partId, canWrite }: { partId: string; canWrite: boolean }) {
  const { data: files } = useSuspenseQuery(partFilesQueryOptions(partId));
  const [removing, setRemoving] = useState<PartFile | null>(null);
  const remove = useRemoveDatasheet(partId);

  return (
    <div className="flex flex-col gap-4">
      {files.length === 0 ? (
        <p className="text-sm text-muted">No datasheet is attached yet.</p>
      ) : (
        <ul aria-label="Datasheets" className="divide-y divide-rule rounded-lg border border-rule bg-surface">
          {files.map((file) => (
            <li key={file.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-2 text-sm">
              <div className="min-w-0">
                <a href={file.url} download={file.filename} className="font-medium text-copper-dark underline-offset-2 hover:underline">
                  {file.filename}
                </a>
                <span className="ml-2 text-muted tabular-nums">
                  {formatSize(file.sizeBytes)} · added {formatDate(file.createdAt)}
                </span>
              </div>
              {canWrite ? (
                <Button variant="danger" size="sm" aria-label={`Remove ${file.filename}`} onClick={() => setRemoving(file)}>
                  Remove
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      {canWrite ? <UploadDatasheet partId={partId} /> : null}
      <ConfirmDialog
        open={removing !== null}
        title={removing ? `Remove ${removing.filename}?` : ''}
        confirmLabel="Remove datasheet"
        pending={remove.isPending}
        error={remove.isError ? describeError(remove.error) : null}
        onCancel={() => {
          setRemoving(null);
          remove.reset();
        }}
        onConfirm={() => {
          if (removing) remove.mutate(removing.id, { onSuccess: () => setRemoving(null) });
        }}
      >
        The file is deleted from the store; upload it again if you need it back.
      </ConfirmDialog>
    </div>
  );
}
