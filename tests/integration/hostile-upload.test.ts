/**
 * Hostile uploads: file names that try to leave the engagement's storage prefix or to disguise
 * themselves, and files above the size limit. Bad contents (empty, binary, absurd lines) are in
 * datasets-upload.test.ts; who may upload is in datasets-authorisation.test.ts.
 */
import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import { Readable } from 'node:stream';
import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DATASET_MAX_BYTES, DATASET_NAME_MAX } from '../../shared/schemas/datasets';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { datasets } from '../../api/db/schema/index';
import { SESSION_COOKIE } from '../../api/app';
import { makeEngagement, makeUser, signedIn, startTestApp, PASSWORD, type Agent, type TestApp } from './support/test-app';
import { rawUpload } from './support/raw-upload';

let t: TestApp;
let consultant: Agent;
let email = '';
let engagementId = 0;
const CSV = 'arrived_at,service_start,service_end,channel\n2026-01-05T08:00:00Z,2026-01-05T08:01:00Z,2026-01-05T08:05:00Z,desk\n';

beforeAll(async () => {
  t = startTestApp();
  const c = await makeUser(t.ctx, 'consultant');
  email = c.email;
  engagementId = await makeEngagement(t.ctx, [c.id], 'Hostile uploads: ferry ticket office');
  consultant = await signedIn(t.app, c.email);
});
afterAll(() => t.close());

const allKeys = async (): Promise<string[]> => {
  const out = await t.ctx.storage.client.send(new ListObjectsV2Command({ Bucket: t.ctx.storage.bucket }));
  return (out.Contents ?? []).map((o) => o.Key!);
};
const rowCount = async () => (await t.ctx.db.select({ id: datasets.id }).from(datasets).where(eq(datasets.engagementId, engagementId))).length;

describe('file names', () => {
  // What the dataset is shown as: the last path segment, without control or bidi characters.
  it.each([
    ['a relative path up the tree', '../../etc/passwd', 'passwd'],
    ['an absolute path', '/etc/shadow', 'shadow'],
    ['a Windows path', 'C:\\Users\\desk\\..\\ferry log.csv', 'ferry log.csv'],
    ['backslash traversal', '..\\..\\..\\boot.ini', 'boot.ini'],
    ['mixed separators', '..//..\\/etc/hosts', 'hosts'],
    ['a NUL byte (RFC 5987 form)', { encoded: 'ferry%00.csv.exe' }, 'ferry.csv.exe'],
    ['control characters (RFC 5987 form)', { encoded: 'ferry%01%09%1B%7F%C2%85.csv' }, 'ferry.csv'],
    ['an encoded traversal (RFC 5987 form)', { encoded: '..%2F..%2Fetc%2Fpasswd' }, 'passwd'],
    ['a right-to-left override', 'invoice\u202Efdp.csv', 'invoicefdp.csv'],
    ['percent-encoded separators (kept as text)', 'ferry%2F..%2Fx.csv', 'ferry%2F..%2Fx.csv'],
    ['accented letters and symbols', 'données ≤ 5 min.csv', 'données ≤ 5 min.csv'],
    ['markup', '<img src=x onerror=alert(1)>.csv', '<img src=x onerror=alert(1)>.csv'],
  ])('%s: stored under the engagement prefix, shown as a plain name', async (_what, fileName, shown) => {
    const res = await rawUpload(consultant, engagementId, fileName, CSV);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.dataset.name).toBe(shown);
    const [row] = await t.ctx.db.select().from(datasets).where(eq(datasets.id, res.body.dataset.id));
    // The key never comes from the name: the engagement prefix and 24 random hex digits.
    expect(row!.objectKey).toMatch(new RegExp(`^datasets/${engagementId}/[0-9a-f]{24}$`));
    expect(row!.name).toBe(shown);
    const listed = (await consultant.get(`/api/engagements/${engagementId}/datasets`)).body.datasets as { id: number; name: string }[];
    expect(listed.find((d) => d.id === res.body.dataset.id)!.name).toBe(shown);
  });

  it.each([
    ['only dots', '..'],
    ['a raw NUL byte in the part header', Buffer.from('ferry\u0000.csv', 'utf8')],
    ['a raw line break in the part header', 'ferry\r\nX-Injected: 1.csv'],
  ])('refuses %s with 400 naming the file field, storing nothing', async (_what, fileName) => {
    const keys = await allKeys();
    const rows = await rowCount();
    const res = await rawUpload(consultant, engagementId, fileName, CSV);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'validation_failed', issues: [{ path: 'file', message: expect.any(String) }] });
    expect(await allKeys()).toEqual(keys);
    expect(await rowCount()).toBe(rows);
  });

  it('cuts a very long name to the limit on whole characters', async () => {
    const long = `${'ö'.repeat(150)}${'😀'.repeat(150)}.csv`;
    const res = await rawUpload(consultant, engagementId, long, CSV);
    expect(res.status).toBe(201);
    expect(Array.from(res.body.dataset.name as string)).toHaveLength(DATASET_NAME_MAX);
    expect(res.body.dataset.name).toBe(`${'ö'.repeat(150)}${'😀'.repeat(50)}`);
  });

  it('left nothing outside the dataset prefixes of engagements', async () => {
    for (const key of await allKeys()) {
      expect(key).toMatch(/^(datasets\/\d+\/[0-9a-f]{24}|engagements\/\d+\/studies\/\d+\/revisions\/\d+\.pdf)$/);
      expect(key).not.toMatch(/\.\.|passwd|shadow|hosts|boot\.ini/);
    }
  });
});

describe('files above the limit', () => {
  let port = 0;
  let cookie = '';
  let server: ReturnType<typeof t.app.listen>;
  beforeAll(async () => {
    server = t.app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    port = (server.address() as AddressInfo).port;
    const res = await fetch(`http://127.0.0.1:${port}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', [CSRF_HEADER]: CSRF_HEADER_VALUE },
      body: JSON.stringify({ email, password: PASSWORD }),
    });
    cookie = res.headers.getSetCookie().find((c) => c.startsWith(`${SESSION_COOKIE}=`))!.split(';')[0]!;
  });
  afterAll(() => new Promise<void>((r) => server.close(() => r())));

  /** Sends the headers (and whatever `body` streams) and resolves with the answer as soon as it comes. */
  function post(headers: Record<string, string>, body?: Readable): Promise<{ status: number; json: { error: { code: string; message: string } } }> {
    return new Promise((resolve, reject) => {
      const req = httpRequest({ host: '127.0.0.1', port, method: 'POST', path: `/api/engagements/${engagementId}/datasets`, headers: { cookie, [CSRF_HEADER]: CSRF_HEADER_VALUE, ...headers } }, (res) => {
        let text = '';
        res.setEncoding('utf8');
        res.on('data', (c: string) => (text += c));
        res.on('end', () => {
          body?.destroy();
          req.destroy();
          resolve({ status: res.statusCode ?? 0, json: JSON.parse(text) });
        });
      });
      req.on('error', reject);
      if (body) body.pipe(req);
      else req.flushHeaders();
    });
  }

  it('refuses a declared size above the limit with 413 before reading the file', async () => {
    const keys = await allKeys();
    const rows = await rowCount();
    const res = await post({ 'content-type': 'multipart/form-data; boundary=x', 'content-length': String(DATASET_MAX_BYTES + 10 * 1024 * 1024) });
    expect(res.status).toBe(413);
    expect(res.json.error).toMatchObject({ code: 'payload_too_large', message: `The file is larger than ${DATASET_MAX_BYTES / 1024 / 1024} MB.` });
    expect(await allKeys()).toEqual(keys);
    expect(await rowCount()).toBe(rows);
  });

  it('stops a streamed (chunked) file at the limit with 413 and keeps nothing of it', async () => {
    const keys = await allKeys();
    const rows = await rowCount();
    const boundary = 'hostile-chunked';
    const line = Buffer.from('2026-01-05T08:00:00Z,2026-01-05T08:01:00Z,2026-01-05T08:05:00Z,desk\n'.repeat(16_000));
    let sent = 0;
    const total = DATASET_MAX_BYTES + 8 * 1024 * 1024;
    const body = new Readable({
      read() {
        if (sent === 0) this.push(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="huge.csv"\r\nContent-Type: text/csv\r\n\r\narrived_at,service_start,service_end,channel\n`);
        if (sent >= total) return this.push(null);
        sent += line.length;
        this.push(line);
      },
    });
    const res = await post({ 'content-type': `multipart/form-data; boundary=${boundary}`, 'transfer-encoding': 'chunked' }, body);
    expect(res.status).toBe(413);
    expect(res.json.error.code).toBe('payload_too_large');
    expect(res.json.error.message).toMatch(/larger than 200 MB/);
    // The multipart upload was aborted: no object, no row.
    expect(await allKeys()).toEqual(keys);
    expect(await rowCount()).toBe(rows);
  }, 120_000);
});
