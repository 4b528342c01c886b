import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { startReader } from './readerThread';

export const MAX_UPLOAD_BYTES = 256 * 1024 * 1024;

/**
 * Starts the thread that will read the upload while the upload is still arriving: starting one takes about 0.3 s,
 * which a large file's upload then hides. The import stops it; so does the response ending without an import.
 */
export const readerAhead: RequestHandler = (_req, res, next) => {
  const reader = startReader();
  res.locals.reader = reader;
  res.on('close', () => reader.stop());
  next();
};

/** One logger file per request, streamed to a temporary file (never held in memory) and removed when the response ends. */
export function singleFileUpload(): RequestHandler[] {
  const upload = multer({
    dest: tmpdir(),
    limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 20 },
  }).single('file');
  const cleanup: RequestHandler = (req, res, next) => {
    res.on('close', () => {
      if (req.file) void rm(req.file.path, { force: true });
    });
    next();
  };
  const limitMessage: RequestHandler = (req, _res, next) => {
    upload(req, _res, (err?: unknown) => {
      if (err && (err as { code?: string }).code === 'LIMIT_FILE_SIZE') {
        (err as Error).message = `The file is larger than ${MAX_UPLOAD_BYTES / 1024 / 1024} MB. Split it by date, or import it with the coldknit command from the computer it is on.`;
      }
      next(err);
    });
  };
  return [limitMessage, cleanup];
}
