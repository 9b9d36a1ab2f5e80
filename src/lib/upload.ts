import { ApiError, NETWORK_ERROR, type FieldProblem } from './api-client';

/** How far an upload has gone: bytes sent of the total, or null while the size is unknown. */
export type UploadProgress = { loaded: number; total: number | null };

export type UploadOptions = {
  /** Extra form fields sent beside the file (a column mapping, a supplier). */
  fields?: Record<string, string | undefined>;
  query?: Record<string, string | undefined>;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
};

/**
 * What an upload's answer means: the parsed body on success, else an ApiError carrying
 * the server's message and details (413, 415 and 422 each have a message to show).
 */
export function readUploadAnswer<T>(status: number, text: string): T {
  let payload: unknown;
  try {
    payload = text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    payload = undefined;
  }
  if (status >= 200 && status < 300) return payload as T;
  if (status === 0) throw new ApiError(0, NETWORK_ERROR, 'The server could not be reached.');
  const error =
    payload && typeof payload === 'object' && 'error' in payload
      ? (payload as { error: { code?: string; message?: string; details?: FieldProblem[] } }).error
      : null;
  if (error && typeof error === 'object' && typeof error.code === 'string') {
    return fail(status, error.code, error.message || `The upload failed (${status}).`, error.details ?? []);
  }
  if (status === 413) return fail(status, 'too_large', 'The file is too large to upload.');
  const code = status === 503 ? 'database_unavailable' : 'http_error';
  return fail(status, code, `The server answered with an error (${status}).`);
}

function fail(status: number, code: string, message: string, details: FieldProblem[] = []): never {
  throw new ApiError(status, code, message, details);
}

/** Percent done, or null while the browser does not know the size yet. */
export function progressPercent(progress: UploadProgress | null): number | null {
  if (!progress || !progress.total) return null;
  return Math.min(100, Math.round((progress.loaded / progress.total) * 100));
}

/**
 * Posts one file as multipart form data (field `file`) with upload progress. fetch()
 * cannot report upload progress, so this one request type uses XMLHttpRequest; it
 * sends the same cross-site header as the API client and fails with the same ApiError.
 */
export function uploadFile<T>(path: string, file: File, options: UploadOptions = {}): Promise<T> {
  const form = new FormData();
  form.append('file', file, file.name);
  for (const [name, value] of Object.entries(options.fields ?? {})) {
    if (value !== undefined) form.append(name, value);
  }
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(options.query ?? {})) if (value !== undefined) params.set(key, value);
  const url = params.size ? `${path}?${params.toString()}` : path;

  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('X-Requested-With', 'farthing');
    xhr.upload.onprogress = (event) => {
      options.onProgress?.({ loaded: event.loaded, total: event.lengthComputable ? event.total : null });
    };
    xhr.onload = () => {
      try {
        resolve(readUploadAnswer<T>(xhr.status, xhr.responseText));
      } catch (error) {
        reject(error);
      }
    };
    xhr.onerror = () => reject(new ApiError(0, NETWORK_ERROR, 'The server could not be reached.'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    if (options.signal) {
      if (options.signal.aborted) {
        reject(new DOMException('The upload was cancelled.', 'AbortError'));
        return;
      }
      options.signal.addEventListener('abort', () => xhr.abort(), { once: true });
    }
    xhr.send(form);
  });
}
