/**
 * Local stand-in for S3: s3rver on loopback, reached through the same @aws-sdk/client-s3 calls
 * production uses. Objects live in a folder so a restart keeps them.
 */
import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';
import { assertPortFree } from '../scripts/stack/ports';

export interface S3Fake {
  endpoint: string;
  stop(): Promise<void>;
}

export async function startS3Fake(opts: { port: number; directory: string; bucket: string }): Promise<S3Fake> {
  await assertPortFree(opts.port, 'the S3 fake (S3_PORT)');
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    port: opts.port,
    address: '127.0.0.1',
    directory: opts.directory,
    silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  await server.run();
  return { endpoint: `http://127.0.0.1:${opts.port}`, stop: () => server.close() };
}

/** s3rver's fixed credentials. */
export const S3_FAKE_CREDENTIALS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
