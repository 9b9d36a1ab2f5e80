import { useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { describeError } from '../../../components/ui/error-state';
import { Button } from '../../../components/ui/button';
import { downloadFile, formatBytes, saveBlob, type DownloadProgress } from '../../../lib/download';

/**
 * "Download workbook": the costed BOM as a spreadsheet for the factory, at the quantity
 * the Cost roll tab shows (`?qty=`) or else the planned one. The server streams the file
 * as it writes it, so the bytes received are shown as they arrive.
 */
export function DownloadWorkbookButton({ bomId, revision }: { bomId: string; revision: number }) {
  const [params] = useSearchParams();
  const [progress, setProgress] = useState<DownloadProgress | null>(null);
  const [error, setError] = useState<string | null>(null);
  /** The size of the last file saved, said once it is handed to the browser. */
  const [saved, setSaved] = useState<string | null>(null);
  const running = useRef(false);
  const qty = Number(params.get('qty'));

  const start = async () => {
    if (running.current) return;
    running.current = true;
    setError(null);
    setSaved(null);
    setProgress({ received: 0, total: null });
    try {
      const { blob, filename } = await downloadFile(`/api/boms/${encodeURIComponent(bomId)}/export.xlsx`, {
        query: { qty: Number.isInteger(qty) && qty >= 1 ? qty : undefined },
        onProgress: setProgress,
      });
      const name = filename ?? `BOM rev ${revision} costed BOM.xlsx`;
      saveBlob(blob, name);
      setSaved(formatBytes(blob.size));
    } catch (e) {
      setError(describeError(e));
    } finally {
      running.current = false;
      setProgress(null);
    }
  };

  return (
    <span className="inline-flex items-center gap-2">
      <span role="status" className="text-xs text-muted tabular-nums">
        {progress
          ? progress.received === 0
            ? 'Preparing…'
            : `${formatBytes(progress.received)}${progress.total ? ` of ${formatBytes(progress.total)}` : ''} received`
          : saved
            ? `Saved, ${saved}`
            : null}
      </span>
      {error ? (
        <span role="alert" className="max-w-56 text-xs font-medium text-brick">
          {error}
        </span>
      ) : null}
      <Button variant="secondary" pending={progress !== null} onClick={() => void start()}>
        Download workbook
      </Button>
    </span>
  );
}
