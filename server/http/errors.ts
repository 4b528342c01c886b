import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';

/** Every API error leaves as `{ error: { code, message } }` with this status. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That record') => new ApiError(404, 'not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role may not do this.') => new ApiError(403, 'forbidden', message);
export const unauthorized = (message = 'Sign in first.') => new ApiError(401, 'unauthorized', message);
export const conflict = (code: string, message: string) => new ApiError(409, code, message);
export const badRequest = (code: string, message: string) => new ApiError(400, code, message);

function describeZod(err: ZodError): string {
  return err.issues
    .slice(0, 5)
    .map((i) => (i.path.length ? `${i.path.join('.')}: ${i.message}` : i.message))
    .join('; ');
}

/** Body-parser and multer errors carry a status or a code of their own; translate them instead of answering 500. */
function fromLibrary(err: unknown): ApiError | null {
  if (typeof err !== 'object' || err === null) return null;
  const e = err as { type?: string; status?: number; code?: string; message?: string; name?: string };
  if (e.type === 'entity.parse.failed') return badRequest('invalid_json', 'The request body is not valid JSON.');
  if (e.type === 'entity.too.large') return new ApiError(413, 'too_large', 'The request body is too large.');
  if (e.name === 'MulterError' && e.code === 'LIMIT_FILE_SIZE') {
    return new ApiError(413, 'file_too_large', e.message ?? 'The file is too large.');
  }
  if (e.name === 'MulterError') return badRequest('upload_failed', e.message ?? 'The upload could not be read.');
  if (e.name === 'SequelizeUniqueConstraintError') return conflict('already_exists', 'A record with that name already exists.');
  if (typeof e.status === 'number' && e.status >= 400 && e.status < 500) return new ApiError(e.status, 'bad_request', e.message ?? 'Bad request.');
  return null;
}

export const errorHandler: ErrorRequestHandler = (err, _req, res, next) => {
  if (res.headersSent) return next(err);
  const known =
    err instanceof ApiError ? err : err instanceof ZodError ? badRequest('validation_failed', describeZod(err)) : fromLibrary(err);
  if (known) {
    res.status(known.status).json({ error: { code: known.code, message: known.message } });
    return;
  }
  console.error(err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server; it has been logged.' } });
};
