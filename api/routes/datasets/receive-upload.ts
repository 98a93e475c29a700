import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import { DATASET_MAX_BYTES, DATASET_NAME_MAX } from '../../../shared/schemas/datasets';
import type { AppContext } from '../../context';
import { datasets } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import type { EngagementRow } from '../engagements/engagement-access';
import { DatasetInputError } from './dataset-problem';
import { removeObject, s3UploadStorage, type StoredUpload } from './s3-upload-storage';
import { sniffHead, HEAD_BYTES } from './sniff-head';

/** Multer errors and file problems as the one API error body. */
function toHttpError(err: unknown): unknown {
  if (err instanceof DatasetInputError) {
    const status = err.message.includes('larger than') ? 413 : 400;
    return new HttpError(status, status === 413 ? 'payload_too_large' : 'validation_failed', err.message, [{ path: 'file', message: err.message }]);
  }
  if (err instanceof MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'payload_too_large', `The file is larger than ${DATASET_MAX_BYTES / 1024 / 1024} MB.`, [{ path: 'file', message: 'Too large' }]);
    return new HttpError(400, 'validation_failed', `The upload is not valid (${err.message}); send one file in the "file" field.`, [{ path: 'file', message: err.message }]);
  }
  return err;
}

/**
 * Streams one multipart file into object storage (never into memory), checks its start, and only
 * then inserts the dataset row. A failure at any step leaves neither an object nor a row.
 */
export async function receiveUpload(ctx: AppContext, engagement: EngagementRow, req: Request, res: Response, userId: number): Promise<number> {
  const middleware = multer({
    storage: s3UploadStorage(ctx.storage, () => `datasets/${engagement.id}`),
    limits: { fileSize: DATASET_MAX_BYTES, files: 1, fields: 5, parts: 6 },
  }).single('file');
  await new Promise<void>((resolve, reject) => middleware(req, res, (err?: unknown) => (err ? reject(toHttpError(err)) : resolve())));
  const file = req.file as unknown as (StoredUpload & { originalname: string }) | undefined;
  if (!file) throw new HttpError(400, 'validation_failed', 'Choose a CSV or TSV file to upload.', [{ path: 'file', message: 'Required' }]);
  try {
    const summary = sniffHead(file.head, file.byteSize <= HEAD_BYTES);
    const now = new Date();
    const name = (file.originalname || 'dataset.csv').slice(0, DATASET_NAME_MAX);
    const [row] = await ctx.db.insert(datasets).values({
      engagementId: engagement.id,
      name,
      objectKey: file.objectKey,
      byteSize: file.byteSize,
      sha256: file.sha256,
      detectedDelimiter: summary.delimiter,
      header: summary.header,
      preview: summary.preview,
      uploadedBy: userId,
      createdAt: now,
      updatedAt: now,
    });
    return row.insertId;
  } catch (err) {
    await removeObject(ctx.storage, file.objectKey);
    throw toHttpError(err);
  }
}
