import { getToken } from './auth-token';
import { ApiError, handleUnauthorized, toApiError } from './api-client';

export interface UploadProgress {
  loadedBytes: number;
  totalBytes: number;
  /** 0–1, or null when the browser cannot tell the total size. */
  fraction: number | null;
}

interface UploadOptions {
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

function parse(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

/**
 * POSTs multipart form data with upload progress. `fetch` cannot report upload progress, so this
 * is the one place that uses XMLHttpRequest; tokens, 401s and errors are handled exactly as in
 * the API client (same `ApiError`).
 */
export function uploadForm<T>(
  url: string,
  form: FormData,
  options: UploadOptions = {},
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    const token = getToken();
    xhr.open('POST', url);
    xhr.setRequestHeader('Accept', 'application/json');
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);

    xhr.upload.onprogress = (event) => {
      options.onProgress?.({
        loadedBytes: event.loaded,
        totalBytes: event.total,
        fraction: event.lengthComputable && event.total > 0 ? event.loaded / event.total : null,
      });
    };
    xhr.onload = () => {
      const body = parse(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        resolve(body as T);
        return;
      }
      if (xhr.status === 401 && token) handleUnauthorized();
      reject(toApiError(xhr.status, xhr.statusText, body));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(0, 'Could not reach the Hopwise server. Check your connection and try again.'),
      );
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));

    if (options.signal) {
      if (options.signal.aborted) {
        xhr.abort();
        return;
      }
      options.signal.addEventListener('abort', () => xhr.abort(), { once: true });
    }
    xhr.send(form);
  });
}
