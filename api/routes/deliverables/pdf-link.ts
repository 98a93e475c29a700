import { GetObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import type { PdfLink } from '../../../shared/schemas/revisions';
import type { AppContext } from '../../context';

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

/** A short-lived GET link to a stored PDF, named for the download. Issued only after the caller checked access. */
export async function pdfLink(ctx: AppContext, key: string, fileName: string): Promise<PdfLink> {
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
