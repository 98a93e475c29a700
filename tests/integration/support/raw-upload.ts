/**
 * A multipart upload built byte by byte. supertest's attach() passes the file name through
 * form-data, which applies path.basename first, so a hostile name would never reach the server;
 * here the Content-Disposition carries exactly the bytes given.
 */
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../../shared/api-error';
import type { Agent } from './test-app';

/**
 * `fileName` goes into `filename="…"` as UTF-8 (a Buffer: as raw bytes); `{ encoded }` goes
 * verbatim into the RFC 5987 form `filename*=UTF-8''…` (percent-encoded, so it can carry a NUL).
 */
export function multipartBody(fileName: string | Buffer | { encoded: string }, content: string | Buffer, field = 'file'): { body: Buffer; contentType: string } {
  const boundary = `----sojourn-hostile-${Date.now().toString(16)}`;
  const param =
    typeof fileName === 'string' || Buffer.isBuffer(fileName)
      ? Buffer.concat([Buffer.from('filename="'), typeof fileName === 'string' ? Buffer.from(fileName.replace(/"/g, '%22'), 'utf8') : fileName, Buffer.from('"')])
      : Buffer.from(`filename*=UTF-8''${fileName.encoded}`);
  const body = Buffer.concat([
    Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${field}"; `),
    param,
    Buffer.from('\r\nContent-Type: text/csv\r\n\r\n'),
    Buffer.from(content),
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ]);
  return { body, contentType: `multipart/form-data; boundary=${boundary}` };
}

/** POSTs one file with an arbitrary file name to the engagement's datasets. */
export function rawUpload(a: Agent, engagementId: number, fileName: Parameters<typeof multipartBody>[0], content: string | Buffer) {
  const { body, contentType } = multipartBody(fileName, content);
  return a.raw.post(`/api/engagements/${engagementId}/datasets`).set(CSRF_HEADER, CSRF_HEADER_VALUE).set('Content-Type', contentType).send(body);
}
