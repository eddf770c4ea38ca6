// Receives the multipart upload of a time study: one file in the part named `file` plus text fields,
// held in memory (at most 1 MB). multer's and busboy's failures become the shared error shape with the
// field they concern, so a wrong form never reaches the error handler as a 500.
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { TIME_STUDY_LIMITS } from '../../shared/api/time-studies';
import { badRequest, HttpError } from '../http/http-error';
import { fileTooLarge } from './csv-text';

/** Room for the multipart boundaries and the text fields around the file. */
const FORM_OVERHEAD_BYTES = 64 * 1024;
const TEXT_FIELD_MAX_BYTES = 4 * 1024;

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: TIME_STUDY_LIMITS.fileBytes, files: 1, fields: 8, parts: 9, fieldSize: TEXT_FIELD_MAX_BYTES },
}).single('file');

function declaredLength(req: Request): number | null {
  const raw = req.get('content-length');
  const value = raw === undefined ? Number.NaN : Number(raw);
  return Number.isFinite(value) ? value : null;
}

function uploadError(err: unknown, req: Request): HttpError {
  if (err instanceof multer.MulterError) {
    switch (err.code) {
      case 'LIMIT_FILE_SIZE':
        return fileTooLarge(declaredLength(req));
      case 'LIMIT_UNEXPECTED_FILE':
      case 'LIMIT_FILE_COUNT':
        return badRequest(
          `Send exactly one file, in the form field named "file"${err.field ? ` (got a file in "${err.field}")` : ''}.`,
          [{ path: err.field ?? 'file', message: 'is not the form field for the file; use "file"' }],
        );
      default:
        return badRequest(
          `The upload form is not as expected: ${err.message.toLowerCase()}${err.field ? ` (field "${err.field}")` : ''}.`,
          [{ path: err.field ?? 'file', message: err.message.toLowerCase() }],
        );
    }
  }
  const message = err instanceof Error ? err.message : String(err);
  return badRequest(`The upload could not be read as multipart/form-data (${message}); send the form again.`, [
    { path: 'file', message: 'could not be read' },
  ]);
}

export const receiveTimeStudyUpload: RequestHandler = (req, res, next) => {
  if (!req.is('multipart/form-data')) {
    return next(
      new HttpError(
        415,
        'unsupported_media_type',
        `Send the time study as multipart/form-data with the CSV in a field named "file" (got ${req.get('content-type') ?? 'no Content-Type'}).`,
        [{ path: 'file', message: 'is required' }],
      ),
    );
  }
  const length = declaredLength(req);
  if (length !== null && length > TIME_STUDY_LIMITS.fileBytes + FORM_OVERHEAD_BYTES) {
    // Refused before parsing, so a large file is never buffered; the rest of the body is read and dropped
    // so the client, still sending, hears the answer instead of a reset connection.
    req.resume();
    return next(fileTooLarge(length));
  }
  upload(req, res, (err: unknown) => next(err ? uploadError(err, req) : undefined));
};
