import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * helmet's headers (CSP and the rest), worked out once: helmet runs a dozen middlewares per
 * request to produce headers that never change here, a few per cent of a small API call's CPU.
 * The directives hold no per-request parts (no nonces), so one run gives every response's headers.
 */
export function securityHeaders(options: Parameters<typeof helmet>[0]): RequestHandler {
  const headers: [string, string][] = [];
  const res = {
    setHeader(name: string, value: string | number | readonly string[]) {
      headers.push([name, Array.isArray(value) ? value.join(', ') : String(value)]);
      return this;
    },
    removeHeader() {},
  };
  let failed: unknown;
  helmet(options)({} as IncomingMessage, res as unknown as ServerResponse, (err?: unknown) => {
    failed = err;
  });
  if (failed) throw failed instanceof Error ? failed : new Error(String(failed));
  if (headers.length === 0) throw new Error('helmet set no headers; the precomputed set would be empty.');
  return (_req, response, next) => {
    for (const [name, value] of headers) response.setHeader(name, value);
    next();
  };
}
