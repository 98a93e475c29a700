/** Shared steps of the datasets suites: upload a buffer, map it, wait for the fit, list stored objects. */
import { ListObjectsV2Command, GetObjectCommand } from '@aws-sdk/client-s3';
import { expect } from 'vitest';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import type { DatasetMapping } from '../../shared/schemas/datasets';
import type { AppContext } from '../../api/context';
import type { Agent } from './support/test-app';

export const upload = (a: Agent, engagementId: number, body: Buffer | string, name = 'log.csv') =>
  a.raw.post(`/api/engagements/${engagementId}/datasets`).set(CSRF_HEADER, CSRF_HEADER_VALUE).attach('file', Buffer.from(body), name);

export const EVENT_MAPPING: Omit<DatasetMapping, 'handlingTimeUnit'> & { handlingTimeUnit?: 'seconds' } = {
  kind: 'event_log',
  delimiter: 'comma',
  timestampFormat: 'iso8601',
  timeZone: 'UTC',
  intervalMinutes: 60,
  timeColumn: 'arrived_at',
  serviceStartColumn: 'service_start',
  serviceEndColumn: 'service_end',
  channelColumn: 'channel',
  countColumn: null,
  handlingTimeColumn: null,
};

/** Polls GET /fit until the job ends (fitted or failed). */
export async function waitForFit(a: Agent, id: number): Promise<{ status: string; problem: { message: string; row: number | null; column: string | null } | null; fit: Record<string, unknown> | null }> {
  for (let i = 0; i < 300; i++) {
    const res = await a.get(`/api/datasets/${id}/fit`);
    expect(res.status).toBe(200);
    if (res.body.status === 'fitted' || res.body.status === 'failed') return res.body;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`dataset ${id} did not finish fitting`);
}

/** Keys stored under an engagement's dataset prefix. */
export async function storedKeys(ctx: AppContext, engagementId: number): Promise<string[]> {
  const out = await ctx.storage.client.send(new ListObjectsV2Command({ Bucket: ctx.storage.bucket, Prefix: `datasets/${engagementId}/` }));
  return (out.Contents ?? []).map((o) => o.Key!);
}

export async function storedBytes(ctx: AppContext, key: string): Promise<Buffer> {
  const obj = await ctx.storage.client.send(new GetObjectCommand({ Bucket: ctx.storage.bucket, Key: key }));
  return Buffer.from(await obj.Body!.transformToByteArray());
}
