/**
 * Request bodies that are not JSON (a catalogue CSV, FITS header bytes), sent with
 * XMLHttpRequest because `fetch` cannot report upload progress. Same origin, cookie session
 * (the browser adds Origin itself); the answer is JSON, and a non-2xx answer becomes the same
 * `ApiError` the JSON client throws.
 */
import { ApiError, parseJsonText as parseJson, toApiError as errorFrom } from '@/lib/api';

export type UploadProgress = { loadedBytes: number; totalBytes: number };

type SendBodyOptions = {
  url: string;
  body: Blob | string;
  contentType: string;
  method?: 'POST' | 'PUT';
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
};

function sizeOf(body: Blob | string): number {
  return typeof body === 'string' ? new Blob([body]).size : body.size;
}

/** Sends `body` as is and resolves with the parsed JSON answer; reports upload progress on the way. */
export function sendBody<T>({ url, body, contentType, method = 'POST', onProgress, signal }: SendBodyOptions): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(method, url);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Content-Type', contentType);
    xhr.setRequestHeader('Accept', 'application/json');
    if (onProgress) {
      const total = sizeOf(body);
      xhr.upload.onprogress = (e) => onProgress({ loadedBytes: e.loaded, totalBytes: e.lengthComputable ? e.total : total });
      xhr.upload.onload = () => onProgress({ loadedBytes: total, totalBytes: total });
    }
    xhr.onload = () => {
      const parsed = parseJson(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) resolve(parsed as T);
      else reject(errorFrom(xhr.status, parsed));
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', 'Could not reach the Nightloom server.', undefined, undefined));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    if (signal) {
      if (signal.aborted) return reject(new DOMException('The upload was cancelled.', 'AbortError'));
      signal.addEventListener('abort', () => xhr.abort(), { once: true });
    }
    xhr.send(body);
  });
}

/** Bytes as a Blob for `sendBody` (copied, so a view into a larger buffer sends only its bytes). */
export function bytesBlob(bytes: Uint8Array, type = 'application/octet-stream'): Blob {
  const copy = new Uint8Array(bytes.length);
  copy.set(bytes);
  return new Blob([copy], { type });
}
