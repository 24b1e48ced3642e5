import type { ErrorRequestHandler, RequestHandler } from 'express';
import { z } from 'zod';
import type { Logger } from 'pino';

/** One error type for the whole server; the middleware below turns it into DESIGN.md §5's shape. */
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (message: string, details?: unknown) => new AppError('bad-request', message, 400, details);
export const unauthorized = (message = 'Sign in to continue.') => new AppError('unauthorized', message, 401);
export const forbidden = (message = 'Your role can not do this.') => new AppError('forbidden', message, 403);
export const notFound = (what = 'Resource') => new AppError('not-found', `${what} not found.`, 404);
export const conflict = (message: string, details?: unknown) => new AppError('conflict', message, 409, details);

/** A zod failure as a 422 whose details list each field path and what is allowed. */
export function validationError(error: z.ZodError, message = 'The request did not pass validation.') {
  const details = error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
  return new AppError('validation-failed', message, 422, details);
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('not-found', `No API route for ${req.method} ${req.path}.`, 404));
};

interface HttpishError {
  status?: number;
  statusCode?: number;
  type?: string;
  code?: string;
}

/** Maps errors thrown by body parsers and multer to our codes; everything unknown is a 500 with no detail. */
function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof z.ZodError) return validationError(err);
  const e = (err ?? {}) as HttpishError;
  if (e.type === 'entity.parse.failed') return new AppError('bad-json', 'The request body is not valid JSON.', 400);
  if (e.type === 'entity.too.large' || e.code === 'LIMIT_FILE_SIZE') {
    return new AppError('too-large', 'The request is too large.', 413);
  }
  if (typeof e.code === 'string' && e.code.startsWith('LIMIT_')) return new AppError('bad-upload', 'The upload is malformed.', 400);
  const status = e.status ?? e.statusCode;
  if (status && status >= 400 && status < 500) return new AppError('bad-request', 'The request could not be read.', status);
  return new AppError('internal', 'Something went wrong on the server.', 500);
}

export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err, _req, res, _next) => {
    const appError = toAppError(err);
    if (appError.status >= 500) logger.error({ err }, 'unhandled error');
    const body: { error: { code: string; message: string; details?: unknown } } = {
      error: { code: appError.code, message: appError.message },
    };
    if (appError.details !== undefined) body.error.details = appError.details;
    res.status(appError.status).json(body);
  };
}
