import { apiErrorBodySchema, CSRF_HEADER, CSRF_HEADER_VALUE } from '#shared/api-error';
import { ApiError } from './api-error';

/**
 * Sends one file as multipart/form-data with upload progress (fetch reports none, so this uses
 * XMLHttpRequest), the CSRF header like every state-changing call, and the same ApiError for
 * failures as the api client. `onProgress` gets the share sent, 0–1.
 */
export function uploadFile(path: string, field: string, file: File, onProgress: (share: number) => void, signal?: AbortSignal): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.setRequestHeader(CSRF_HEADER, CSRF_HEADER_VALUE);
    xhr.setRequestHeader('accept', 'application/json');
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      let payload: unknown = null;
      try {
        payload = JSON.parse(xhr.responseText);
      } catch {
        // Not JSON: handled below with a generic message.
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(payload);
      const parsed = apiErrorBodySchema.safeParse(payload);
      if (parsed.success) {
        const { code, message, issues } = parsed.data.error;
        return reject(new ApiError(xhr.status, code, message, issues ?? []));
      }
      reject(new ApiError(xhr.status, xhr.status >= 500 ? 'internal' : 'unknown', `The server answered ${xhr.status} ${xhr.statusText}`.trim()));
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', 'The upload was interrupted. Check your connection and try again.'));
    xhr.onabort = () => reject(new DOMException('Upload cancelled', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort());
    const form = new FormData();
    form.append(field, file);
    xhr.send(form);
  });
}
