import { GetObjectCommand } from '@aws-sdk/client-s3';
import type { ObjectStorage } from '../../storage/object-storage';
import type { DatasetRow } from './dataset-access';
import { HEAD_BYTES } from './sniff-head';

/** The stored file's first HEAD_BYTES (a ranged GET), to re-read the preview with another delimiter. */
export async function readHead(storage: ObjectStorage, dataset: DatasetRow): Promise<{ head: Buffer; complete: boolean }> {
  const obj = await storage.client.send(new GetObjectCommand({ Bucket: storage.bucket, Key: dataset.objectKey, Range: `bytes=0-${HEAD_BYTES - 1}` }));
  const head = Buffer.from(await obj.Body!.transformToByteArray());
  return { head, complete: dataset.byteSize <= HEAD_BYTES };
}
