/** A signed-in conversation with a server over real HTTP (fetch), keeping cookies like a browser. */
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../../shared/api-error';

export interface HttpAnswer {
  status: number;
  body: { error?: { code: string; message: string } } & Record<string, unknown>;
  text: string;
}

export function httpSession(baseUrl: string) {
  const cookies = new Map<string, string>();
  async function call(method: string, path: string, body?: object): Promise<HttpAnswer> {
    const headers: Record<string, string> = { cookie: [...cookies].map(([k, v]) => `${k}=${v}`).join('; ') };
    if (method !== 'GET') headers[CSRF_HEADER] = CSRF_HEADER_VALUE;
    if (body) headers['content-type'] = 'application/json';
    const res = await fetch(`${baseUrl}${path}`, { method, headers, body: body ? JSON.stringify(body) : undefined, signal: AbortSignal.timeout(20_000) });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const at = pair!.indexOf('=');
      cookies.set(pair!.slice(0, at), pair!.slice(at + 1));
    }
    const text = await res.text();
    let parsed: HttpAnswer['body'] = {};
    try {
      parsed = JSON.parse(text) as HttpAnswer['body'];
    } catch {
      // Not JSON: the test looks at `text`.
    }
    return { status: res.status, body: parsed, text };
  }
  return {
    get: (path: string) => call('GET', path),
    post: (path: string, body?: object) => call('POST', path, body ?? {}),
    async signIn(email: string, password: string): Promise<void> {
      const res = await call('POST', '/api/auth/sign-in', { email, password });
      if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${res.text}`);
    },
  };
}
export type HttpSession = ReturnType<typeof httpSession>;
