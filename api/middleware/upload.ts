// Accepts one uploaded file (multipart/form-data) into memory, with a size limit; a file too large
// is refused with 413 and a message naming the field and the limit, a missing one with 400.
import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../lib/app-error';

function megabytes(bytes: number): string {
  return `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;
}

export function singleFileUpload(field: string, maxBytes: number, what: string): RequestHandler {
  const accept = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 20, fieldSize: 4096 },
  }).single(field);
  return (req, res, next) => {
    accept(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          const message = `the ${what} is larger than ${megabytes(maxBytes)}; nothing was changed`;
          return next(new AppError(413, 'too_large', message, { [field]: message }));
        }
        const message =
          err.code === 'LIMIT_UNEXPECTED_FILE'
            ? `send the ${what} as the form field "${field}" (got "${err.field}")`
            : `the upload was refused: ${err.message}`;
        return next(new AppError(400, 'invalid_upload', message, { [field]: message }));
      }
      if (err) return next(err);
      if (!req.file) {
        const message = `choose a ${what} to upload (form field "${field}", multipart/form-data)`;
        return next(new AppError(400, 'invalid_upload', message, { [field]: message }));
      }
      next();
    });
  };
}
