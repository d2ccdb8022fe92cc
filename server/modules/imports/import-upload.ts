/**
 * The CSV upload: multipart/form-data, one file in the field `file`, at most 10 MB, named
 * .csv or sent as text/csv. Held in memory (bounded by the limit) because the importer
 * needs the whole text anyway. Multer's errors become problem details: 413 too large,
 * 415 not a CSV or not multipart, 400 for a malformed form.
 */
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '@/server/errors/app-error';
import type { Upload } from './import.service';

export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;

const unsupported = (detail: string) => new AppError(415, 'unsupported_media_type', detail);

const upload = multer({
  storage: multer.memoryStorage(),
  defParamCharset: 'utf8',
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 10, parts: 12, fieldSize: 10_000 },
  fileFilter: (_req, file, accept) => {
    if (/\.csv$/i.test(file.originalname) || file.mimetype === 'text/csv') return accept(null, true);
    accept(
      unsupported(
        `${file.originalname} is not a CSV file: upload a .csv file (text/csv) saved as "CSV UTF-8 (comma delimited)".`,
      ),
    );
  },
});

const MULTER_MESSAGES: Record<string, string> = {
  LIMIT_UNEXPECTED_FILE: 'Send exactly one file, in the form field named "file".',
  LIMIT_FILE_COUNT: 'Send exactly one file, in the form field named "file".',
};

function toProblem(err: unknown): unknown {
  if (err instanceof AppError) return err;
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE')
      return new AppError(
        413,
        'payload_too_large',
        'The file is larger than 10 MB. Split it into smaller files and import them one after another.',
      );
    return AppError.badRequest(MULTER_MESSAGES[err.code] ?? `The upload form is not valid (${err.message}).`);
  }
  // busboy: a truncated or malformed multipart body.
  return AppError.badRequest('The upload could not be read: the multipart form is malformed or incomplete.');
}

export const uploadCsv: RequestHandler = (req, res, next) => {
  if (!req.is('multipart/form-data')) {
    return next(unsupported('Send the CSV file as multipart/form-data, in the form field named "file".'));
  }
  upload.single('file')(req, res, (err?: unknown) => next(err ? toProblem(err) : undefined));
};

/** The uploaded file; 400 when the form has no file field. */
export function uploadedFile(req: Request): Upload {
  if (!req.file)
    throw AppError.badRequest('No file: send the CSV in the form field named "file".', [
      { path: 'file', message: 'required' },
    ]);
  return { fileName: req.file.originalname || 'upload.csv', bytes: req.file.buffer };
}
