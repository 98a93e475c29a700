import { createHash, randomBytes } from 'node:crypto';
import { Transform, type TransformCallback } from 'node:stream';
import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import type { Request } from 'express';
import type { StorageEngine } from 'multer';
import { DATASET_MAX_BYTES } from '../../../shared/schemas/datasets';
import type { ObjectStorage } from '../../storage/object-storage';
import { DatasetInputError } from './dataset-problem';
import { HEAD_BYTES, looksBinary } from './sniff-head';

/** What the engine reports for a stored file (multer merges it into req.file). */
export interface StoredUpload {
  objectKey: string;
  byteSize: number;
  sha256: string;
  /** The first HEAD_BYTES of the file, for the checks and the preview. */
  head: Buffer;
}

/** Counts, hashes and keeps the head while the bytes pass; refuses binaries and oversize files early. */
class Tally extends Transform {
  readonly hash = createHash('sha256');
  bytes = 0;
  private headParts: Buffer[] = [];
  private headLength = 0;
  private checked = false;

  get head(): Buffer {
    return Buffer.concat(this.headParts);
  }

  override _transform(chunk: Buffer, _enc: BufferEncoding, done: TransformCallback): void {
    this.bytes += chunk.length;
    if (this.bytes > DATASET_MAX_BYTES) return done(new DatasetInputError(`The file is larger than ${DATASET_MAX_BYTES / 1024 / 1024} MB.`));
    this.hash.update(chunk);
    if (this.headLength < HEAD_BYTES) {
      const part = chunk.subarray(0, HEAD_BYTES - this.headLength);
      this.headParts.push(part);
      this.headLength += part.length;
    }
    // Stop a binary at its first 8 KB instead of storing 200 MB of it.
    if (!this.checked && this.headLength >= 8192) {
      this.checked = true;
      if (looksBinary(this.head)) return done(new DatasetInputError('This is not a text file (it contains binary data). Upload a CSV or TSV export.'));
    }
    done(null, chunk);
  }
}

/** Best-effort removal of an object (after a failure elsewhere); errors are logged, not thrown. */
export async function removeObject(storage: ObjectStorage, key: string): Promise<void> {
  await storage.client.send(new DeleteObjectCommand({ Bucket: storage.bucket, Key: key })).catch((err: Error) => console.error(`[datasets] could not remove ${key}: ${err.message}`));
}

/**
 * A multer storage engine that streams the file into object storage with lib-storage's Upload
 * (multipart for large files: 8 MB parts, two in flight, so memory stays near 16 MB whatever the
 * size). On any failure the multipart upload is aborted, so nothing half-stored remains.
 */
export function s3UploadStorage(storage: ObjectStorage, keyFor: (req: Request) => string): StorageEngine {
  return {
    _handleFile(req, file, cb) {
      const objectKey = `${keyFor(req)}/${randomBytes(12).toString('hex')}`;
      const tally = new Tally();
      const upload = new Upload({
        client: storage.client,
        params: { Bucket: storage.bucket, Key: objectKey, Body: tally, ContentType: 'text/csv' },
        partSize: 8 * 1024 * 1024,
        queueSize: 2,
        leavePartsOnError: false,
      });
      let failure: Error | null = null;
      // Failing destroys the body stream: lib-storage then aborts the multipart upload itself
      // before done() rejects, so the callback runs only once nothing is left in storage.
      const fail = (err: Error): void => {
        failure ??= err;
        file.stream.unpipe(tally);
        file.stream.resume();
        if (!tally.destroyed) tally.destroy(failure);
      };
      const tooLarge = () => new DatasetInputError(`The file is larger than ${DATASET_MAX_BYTES / 1024 / 1024} MB.`);
      tally.on('error', fail);
      file.stream.on('error', fail);
      file.stream.on('limit', () => fail(tooLarge()));
      file.stream.on('close', () => {
        if (!file.stream.readableEnded) fail(new Error('The upload was interrupted.'));
      });
      file.stream.pipe(tally);
      const cleanUp = (): void => void removeObject(storage, objectKey).finally(() => cb(failure));
      upload.done().then(
        () => {
          if (!failure && (file.stream as { truncated?: boolean }).truncated) failure = tooLarge();
          // A small file goes up as one PutObject that may have landed before a late failure.
          if (failure) return cleanUp();
          const info: StoredUpload = { objectKey, byteSize: tally.bytes, sha256: tally.hash.digest('hex'), head: tally.head };
          cb(null, info as unknown as Partial<Express.Multer.File>);
        },
        (err: Error) => {
          failure ??= err;
          cleanUp();
        },
      );
    },
    _removeFile(_req, file, cb) {
      const key = (file as unknown as Partial<StoredUpload>).objectKey;
      if (!key) return cb(null);
      void removeObject(storage, key).finally(() => cb(null));
    },
  };
}
