/**
 * Puts the invented counter log into the "Permit counter wait times" demo engagement once S3 is
 * up: stores the file (read back and compared by SHA-256, since fake S3 has corrupted stream
 * uploads before), adds the dataset row with its mapping, and fits it. Idempotent: a second
 * start finds the dataset by name and does nothing.
 */
import { createHash, randomBytes } from 'node:crypto';
import { GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { and, eq } from 'drizzle-orm';
import type { Config } from '../api/config';
import type { Db } from '../api/db/client';
import { datasets, engagements, users } from '../api/db/schema/index';
import { kickFit } from '../api/routes/datasets/fit-job';
import { sniffHead } from '../api/routes/datasets/sniff-head';
import { createObjectStorage } from '../api/storage/object-storage';
import type { DatasetMapping } from '../shared/schemas/datasets';
import { DEMO_LOG_OPTIONS, eventLogCsv } from './demo-event-log';

export const DEMO_DATASET_NAME = 'permit-counter-march.csv';

const MAPPING: DatasetMapping = {
  kind: 'event_log',
  delimiter: 'comma',
  timestampFormat: 'iso8601',
  timeZone: 'UTC',
  intervalMinutes: 30,
  timeColumn: 'arrived_at',
  serviceStartColumn: 'service_start',
  serviceEndColumn: 'service_end',
  channelColumn: 'channel',
  countColumn: null,
  handlingTimeColumn: null,
  handlingTimeUnit: 'seconds',
};

export async function seedDemoDataset(db: Db, s3: Config['s3']): Promise<boolean> {
  const [engagement] = await db.select({ id: engagements.id }).from(engagements).where(eq(engagements.name, 'Permit counter wait times'));
  if (!engagement) return false;
  const [existing] = await db.select({ id: datasets.id }).from(datasets).where(and(eq(datasets.engagementId, engagement.id), eq(datasets.name, DEMO_DATASET_NAME)));
  if (existing) return false;
  const storage = createObjectStorage(s3);
  try {
    const body = Buffer.from(eventLogCsv(DEMO_LOG_OPTIONS));
    const sha256 = createHash('sha256').update(body).digest('hex');
    const objectKey = `datasets/${engagement.id}/${randomBytes(12).toString('hex')}`;
    await storage.client.send(new PutObjectCommand({ Bucket: storage.bucket, Key: objectKey, Body: body, ContentType: 'text/csv' }));
    const back = await storage.client.send(new GetObjectCommand({ Bucket: storage.bucket, Key: objectKey }));
    const backSha = createHash('sha256').update(await back.Body!.transformToByteArray()).digest('hex');
    if (backSha !== sha256) throw new Error('the demo event log came back from storage changed');
    const head = sniffHead(body.subarray(0, 256 * 1024), body.length <= 256 * 1024);
    const [consultant] = await db.select({ id: users.id }).from(users).where(eq(users.email, 'consultant@sojourn.test'));
    const now = new Date();
    const [res] = await db.insert(datasets).values({
      engagementId: engagement.id,
      name: DEMO_DATASET_NAME,
      objectKey,
      byteSize: body.length,
      sha256,
      detectedDelimiter: head.delimiter,
      header: head.header,
      preview: head.preview,
      status: 'mapped',
      mapping: MAPPING,
      uploadedBy: consultant?.id ?? null,
      createdAt: now,
      updatedAt: now,
    });
    await (await kickFit({ db, storage }, res.insertId)).whenDone;
    return true;
  } finally {
    storage.client.destroy();
  }
}
