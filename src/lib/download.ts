import { ApiError, NETWORK_ERROR, type FieldProblem } from './api-client';

/** How much of a download has arrived: bytes so far, and the total when the server said it. */
export type DownloadProgress = { received: number; total: number | null };

export type DownloadOptions = {
  query?: Record<string, string | number | undefined>;
  onProgress?: (progress: DownloadProgress) => void;
  signal?: AbortSignal;
};

/**
 * The file name a Content-Disposition header offers: the RFC 6266 `filename*` (UTF-8,
 * percent-encoded) when present, else the plain `filename`; null when neither is. Any
 * folder part is dropped, so a name can never point outside the download folder.
 */
export function filenameFromDisposition(header: string | null): string | null {
  if (!header) return null;
  const star = /filename\*\s*=\s*([^']*)'[^']*'([^;]+)/i.exec(header);
  let name: string | null = null;
  if (star) {
    try {
      name = decodeURIComponent(star[2].trim().replace(/^"|"$/g, ''));
    } catch {
      name = null;
    }
  }
  if (!name) {
    const plain = /filename\s*=\s*("((?:[^"\\]|\\.)*)"|[^;]+)/i.exec(header);
    if (plain) name = plain[2] !== undefined ? plain[2].replace(/\\(.)/g, '$1') : plain[1].trim();
  }
  if (!name) return null;
  const base = name.split(/[\\/]/).pop()?.trim() ?? '';
  return base || null;
}

async function failureOf(response: Response): Promise<ApiError> {
  let payload: unknown;
  try {
    payload = await response.json();
  } catch {
    payload = undefined;
  }
  const error = payload && typeof payload === 'object' && 'error' in payload ? (payload as { error: { code?: string; message?: string; details?: FieldProblem[] } }).error : null;
  if (error && typeof error.code === 'string') return new ApiError(response.status, error.code, error.message || `The download failed (${response.status}).`, error.details ?? []);
  const code = response.status === 503 ? 'database_unavailable' : 'http_error';
  return new ApiError(response.status, code, `The server answered with an error (${response.status}).`);
}

/**
 * Fetches a file the server streams (a workbook) and reports the bytes as they arrive:
 * the server writes it as it goes, so the size is often unknown until the end. Sends the
 * session cookie like the API client and fails with the same ApiError; it never saves
 * or shows anything itself.
 */
export async function downloadFile(path: string, options: DownloadOptions = {}): Promise<{ blob: Blob; filename: string | null }> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(options.query ?? {})) if (value !== undefined) params.set(key, String(value));
  const url = params.size ? `${path}?${params.toString()}` : path;

  let response: Response;
  try {
    response = await fetch(url, { credentials: 'same-origin', signal: options.signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, NETWORK_ERROR, 'The server could not be reached.');
  }
  if (!response.ok) throw await failureOf(response);

  const length = Number(response.headers.get('Content-Length'));
  const total = Number.isFinite(length) && length > 0 ? length : null;
  const type = response.headers.get('Content-Type') ?? 'application/octet-stream';
  const filename = filenameFromDisposition(response.headers.get('Content-Disposition'));
  options.onProgress?.({ received: 0, total });
  if (!response.body) {
    const blob = await response.blob();
    options.onProgress?.({ received: blob.size, total });
    return { blob, filename };
  }

  const reader = response.body.getReader();
  const chunks: Uint8Array<ArrayBuffer>[] = [];
  let received = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      chunks.push(value);
      received += value.byteLength;
      options.onProgress?.({ received, total });
    }
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    // The server cuts the connection when the file fails half-way: never save a short file.
    throw new ApiError(0, NETWORK_ERROR, 'The download was cut off before the file was complete.');
  }
  return { blob: new Blob(chunks, { type }), filename };
}

/** Hands a downloaded file to the browser to save under its name. */
export function saveBlob(blob: Blob, filename: string): void {
  const href = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = href;
  link.download = filename;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Let the click start the save before the address is let go.
  window.setTimeout(() => URL.revokeObjectURL(href), 10_000);
}

/** "48.2 kB", "1.3 MB": bytes as a person reads them (decimal units). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  if (bytes < 1_000_000) return `${(bytes / 1000).toFixed(1)} kB`;
  return `${(bytes / 1_000_000).toFixed(1)} MB`;
}
