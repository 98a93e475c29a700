import type { z } from 'zod';
import { apiErrorBodySchema, CSRF_HEADER, CSRF_HEADER_VALUE } from '#shared/api-error';
import { ApiError } from './api-error';

export { ApiError } from './api-error';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
type Query = Record<string, string | number | boolean | undefined | null>;

interface RequestOptions<S extends z.ZodType | undefined> {
  method?: Method;
  /** JSON by default; a FormData or Blob (a file upload) is sent as it is. */
  body?: unknown;
  query?: Query;
  /** Checks the answer against the shared contract, so drift shows as one clear error. */
  schema?: S;
  signal?: AbortSignal;
}

type Result<S> = S extends z.ZodType ? z.infer<S> : void;

function buildUrl(path: string, query?: Query): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
}

async function readError(res: Response): Promise<ApiError> {
  let payload: unknown = null;
  try {
    payload = await res.json();
  } catch {
    // Not JSON (a proxy page, an empty body): fall through to a generic message.
  }
  const parsed = apiErrorBodySchema.safeParse(payload);
  if (parsed.success) {
    const { code, message, issues } = parsed.data.error;
    return new ApiError(res.status, code, message, issues ?? []);
  }
  return new ApiError(res.status, res.status >= 500 ? 'internal' : 'unknown', `The server answered ${res.status} ${res.statusText}`.trim());
}

/**
 * The only way the web app talks to the API: same-origin cookies, JSON both ways (or a file up), the CSRF
 * header on every state-changing request, and one error type for every failure.
 */
export async function api<S extends z.ZodType | undefined = undefined>(path: string, options: RequestOptions<S> = {}): Promise<Result<S>> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { accept: 'application/json' };
  if (method !== 'GET') headers[CSRF_HEADER] = CSRF_HEADER_VALUE;
  // Files go as they are: FormData sets its own multipart boundary, a Blob names its type.
  const raw = options.body instanceof FormData || options.body instanceof Blob;
  if (options.body instanceof Blob) headers['content-type'] = options.body.type || 'application/octet-stream';
  else if (options.body !== undefined && !raw) headers['content-type'] = 'application/json';

  let res: Response;
  try {
    res = await fetch(buildUrl(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : raw ? (options.body as BodyInit) : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (err) {
    if ((err as Error).name === 'AbortError') throw err;
    throw new ApiError(0, 'network', 'Sojourn could not reach the server. Check your connection and try again.');
  }

  if (!res.ok) throw await readError(res);
  if (!options.schema || res.status === 204) return undefined as Result<S>;

  const data: unknown = await res.json();
  const parsed = options.schema.safeParse(data);
  if (!parsed.success) {
    console.error(`Unexpected answer from ${method} ${path}`, parsed.error.issues);
    throw new ApiError(res.status, 'unexpected_response', 'The server sent an answer this page does not understand.');
  }
  return parsed.data as Result<S>;
}
