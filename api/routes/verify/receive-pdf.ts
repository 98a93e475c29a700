import express, { type Request, type RequestHandler } from 'express';
import multer, { MulterError } from 'multer';
import { VERIFY_MAX_BYTES } from '../../../shared/schemas/revisions';
import { HttpError } from '../../http-error';

const raw = express.raw({ type: ['application/pdf', 'application/octet-stream'], limit: VERIFY_MAX_BYTES });
const form = multer({ storage: multer.memoryStorage(), limits: { fileSize: VERIFY_MAX_BYTES, files: 1, fields: 5 } }).single('file');

/**
 * Takes the PDF to verify either as the raw body (application/pdf) or as the `file` field of a
 * multipart form, in memory (at most VERIFY_MAX_BYTES: a report is a few hundred kB).
 */
export const receivePdf: RequestHandler = (req, res, next) => {
  if (req.is('multipart/form-data')) {
    form(req, res, (err: unknown) => {
      if (err instanceof MulterError && err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'payload_too_large', `A PDF to verify may be at most ${VERIFY_MAX_BYTES / 1024 / 1024} MB.`));
      if (err instanceof MulterError) return next(new HttpError(400, 'validation_failed', `The upload is not valid: ${err.message}.`, [{ path: 'file', message: err.message }]));
      next(err as Error | undefined);
    });
    return;
  }
  raw(req, res, next);
};

/** The received bytes, or a 400 naming what to send. */
export function receivedPdf(req: Request): Buffer {
  const file = (req as Request & { file?: { buffer: Buffer } }).file?.buffer ?? (Buffer.isBuffer(req.body) ? req.body : null);
  if (!file || file.length === 0) {
    throw new HttpError(400, 'validation_failed', 'Send the PDF as the request body (Content-Type: application/pdf) or as the "file" field of a form.', [{ path: 'file', message: 'Choose a PDF file' }]);
  }
  return file;
}
