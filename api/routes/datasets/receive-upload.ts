import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import { DATASET_MAX_BYTES } from '../../../shared/schemas/datasets';
import type { AppContext } from '../../context';
import { datasets } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import type { EngagementRow } from '../engagements/engagement-access';
import { datasetName } from './dataset-name';
import { DatasetInputError } from './dataset-problem';
import { removeObject, s3UploadStorage, type StoredUpload } from './s3-upload-storage';
import { sniffHead, HEAD_BYTES } from './sniff-head';

/** Room for the multipart framing and the few small fields around the file. */
const ENVELOPE_BYTES = 64 * 1024;

/**
 * What busboy (multer's parser) throws for a body that is not a well-formed multipart form, e.g. a
 * raw NUL or line break in a part header. The client's error, not the server's: 400, not 500.
 */
const MALFORMED = ['Malformed', 'Missing Content-Type', 'Unsupported content type', 'Multipart: Boundary not found', 'Unexpected end of'];

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
  if (err instanceof Error && MALFORMED.some((m) => err.message.startsWith(m))) {
    return new HttpError(400, 'validation_failed', `The upload is not a valid form (${err.message}); send one file in the "file" field.`, [{ path: 'file', message: err.message }]);
  }
  return err;
}

/**
 * Streams one multipart file into object storage (never into memory), checks its start, and only
 * then inserts the dataset row. A failure at any step leaves neither an object nor a row.
 */
export async function receiveUpload(ctx: AppContext, engagement: EngagementRow, req: Request, res: Response, userId: number): Promise<number> {
  // A declared size above the limit is refused before a byte is read (a browser learns at once
  // instead of after sending the whole file); the connection is closed rather than drained.
  // Bodies without a length (chunked) are still cut off by the limit while streaming.
  if (Number(req.get('content-length') ?? 0) > DATASET_MAX_BYTES + ENVELOPE_BYTES) {
    res.set('Connection', 'close');
    throw toHttpError(new MulterError('LIMIT_FILE_SIZE', 'file'));
  }
  const middleware = multer({
    storage: s3UploadStorage(ctx.storage, () => `datasets/${engagement.id}`),
    limits: { fileSize: DATASET_MAX_BYTES, files: 1, fields: 5, parts: 6 },
    // Browsers send the file name as raw UTF-8 bytes; busboy's default (latin1) turned
    // "données.csv" into "donnÃ©es.csv".
    defParamCharset: 'utf8',
  }).single('file');
  await new Promise<void>((resolve, reject) => middleware(req, res, (err?: unknown) => (err ? reject(toHttpError(err)) : resolve())));
  const file = req.file as unknown as (StoredUpload & { originalname: string }) | undefined;
  if (!file) throw new HttpError(400, 'validation_failed', 'Choose a CSV or TSV file to upload.', [{ path: 'file', message: 'Required' }]);
  try {
    const summary = sniffHead(file.head, file.byteSize <= HEAD_BYTES);
    const now = new Date();
    const name = datasetName(file.originalname);
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
