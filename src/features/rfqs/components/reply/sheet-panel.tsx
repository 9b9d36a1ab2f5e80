import { useId, useRef } from 'react';
import { buttonClasses } from '../../../../components/ui/button';
import { FormAlert } from '../../../../components/ui/form-alert';
import { Spinner } from '../../../../components/ui/spinner';
import { describeError } from '../../../../components/ui/error-state';
import { isApiError } from '../../../../lib/api-client';
import { replySheetUrl, type ReplyResult } from '../../reply-api';
import { useUploadReplySheet } from '../../reply-hooks';
import { sheetProblemPlace } from '../../sheet-problems';

/**
 * The spreadsheet way to answer: download the sheet of this request, fill it offline,
 * upload it. The server checks it like the form, all or nothing, and names each problem
 * by its row.
 */
export function SheetPanel({ token, onSent }: { token: string; onSent: (result: ReplyResult) => void }) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const upload = useUploadReplySheet(token);
  const error = upload.error;

  return (
    <section aria-labelledby={`${inputId}-title`} className="flex flex-col gap-3 rounded-lg border border-rule bg-surface p-4 sm:p-5">
      <div>
        <h2 id={`${inputId}-title`} className="text-base font-semibold">
          Prefer a spreadsheet?
        </h2>
        <p className="mt-1 text-sm text-muted">
          Download the sheet with every part of this request, fill in prices (or “yes” under Decline), and upload it here. Nothing is saved
          unless the whole sheet reads correctly.
        </p>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <a href={replySheetUrl(token)} download className={buttonClasses('secondary')}>
          Download sheet
        </a>
        <label htmlFor={inputId} className={`${buttonClasses('secondary')} cursor-pointer focus-within:outline-2`}>
          {upload.isPending ? <Spinner /> : null}
          Upload filled sheet
        </label>
        <input
          ref={inputRef}
          id={inputId}
          type="file"
          accept=".xlsx,.csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet,text/csv"
          className="sr-only"
          disabled={upload.isPending}
          onChange={(event) => {
            const file = event.target.files?.[0];
            if (!file) return;
            upload.mutate(file, {
              onSuccess: onSent,
              // Choosing the same file again after fixing it must fire a change.
              onSettled: () => {
                if (inputRef.current) inputRef.current.value = '';
              },
            });
          }}
        />
        {upload.isPending ? (
          <span role="status" className="text-sm text-muted">
            Reading the sheet…
          </span>
        ) : null}
      </div>
      {upload.isError ? (
        <FormAlert>
          <p className="font-medium">{describeError(error)}</p>
          {isApiError(error) && error.details.length ? (
            <ul className="mt-1 list-disc pl-5">
              {error.details.map((detail, n) => (
                <li key={n}>
                  <span className="font-medium">{sheetProblemPlace(detail.path)}</span> {detail.message}
                </li>
              ))}
            </ul>
          ) : null}
        </FormAlert>
      ) : null}
    </section>
  );
}
