import { HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import type { Config } from '../config';

/**
 * S3-compatible object storage (s3rver locally, S3 in production). The checksum settings keep
 * s3rver from storing aws-chunked framing verbatim; they are harmless against real S3.
 */
export function createObjectStorage(cfg: Config['s3']) {
  const client = new S3Client({
    region: cfg.region,
    endpoint: cfg.endpoint,
    forcePathStyle: cfg.forcePathStyle,
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    ...(cfg.accessKeyId && cfg.secretAccessKey
      ? { credentials: { accessKeyId: cfg.accessKeyId, secretAccessKey: cfg.secretAccessKey } }
      : {}),
    maxAttempts: 2,
  });
  return {
    client,
    bucket: cfg.bucket,
    /** Cheap reachability check for /api/health. */
    async check(): Promise<boolean> {
      try {
        await client.send(new HeadBucketCommand({ Bucket: cfg.bucket }), { abortSignal: AbortSignal.timeout(2_000) });
        return true;
      } catch {
        return false;
      }
    },
  };
}

export type ObjectStorage = ReturnType<typeof createObjectStorage>;
