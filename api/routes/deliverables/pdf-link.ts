import { GetObjectCommand, HeadObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import type { PdfLink } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';
import { HttpError } from '../../http-error';

/** How long the existence check may take before storage counts as unreachable. */
const CHECK_MS = 3_000;

const presigners = new WeakMap<AppContext, S3Client>();

/**
 * The client that signs download links. Normally the app's own storage client; when browsers
 * reach storage at another address than the API does (S3_PUBLIC_ENDPOINT), a client for that
 * address, because the host is part of what the signature covers.
 */
function presigner(ctx: AppContext): S3Client {
  const s3 = ctx.config.s3;
  if (!s3.publicEndpoint || s3.publicEndpoint === s3.endpoint) return ctx.storage.client;
  let c = presigners.get(ctx);
  if (!c) {
    c = new S3Client({
      region: s3.region,
      endpoint: s3.publicEndpoint,
      forcePathStyle: s3.forcePathStyle,
      ...(s3.accessKeyId && s3.secretAccessKey ? { credentials: { accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey } } : {}),
    });
    presigners.set(ctx, c);
  }
  return c;
}

/**
 * Makes sure the stored PDF can be fetched before a link to it is handed out: signing a link is
 * local arithmetic and would succeed while storage is down, leaving the person with a link that
 * fails in the browser with a storage error page. Unreachable or failing storage answers 503
 * with a plain message (nothing is lost; try later); a missing object is a fault of ours (500).
 */
async function assertStored(ctx: AppContext, key: string): Promise<void> {
  try {
    await ctx.storage.client.send(new HeadObjectCommand({ Bucket: ctx.storage.bucket, Key: key }), { abortSignal: AbortSignal.timeout(CHECK_MS) });
  } catch (err) {
    const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
    const status = e.$metadata?.httpStatusCode;
    if (status === 404 || e.name === 'NotFound') {
      throw new HttpError(500, 'deliverable_missing', 'The signed PDF of this revision is missing from the file store. This has been logged; please tell the firm.');
    }
    if (status === undefined || status >= 500) {
      throw new HttpError(503, 'storage_unavailable', 'The file store is unreachable, so the signed PDF cannot be downloaded right now. Nothing is lost; try again in a few minutes.');
    }
    throw err;
  }
}

/** A short-lived GET link to a stored PDF, named for the download. Issued only after the caller checked access. */
export async function pdfLink(ctx: AppContext, key: string, fileName: string): Promise<PdfLink> {
  await assertStored(ctx, key);
  const seconds = ctx.config.deliverableLinkSeconds;
  const command = new GetObjectCommand({
    Bucket: ctx.storage.bucket,
    Key: key,
    ResponseContentType: 'application/pdf',
    ResponseContentDisposition: `attachment; filename="${fileName.replace(/[^\w.-]+/g, '-')}"`,
  });
  const url = await getSignedUrl(presigner(ctx), command, { expiresIn: seconds });
  return { url, expiresAt: new Date(Date.now() + seconds * 1000).toISOString(), fileName };
}
