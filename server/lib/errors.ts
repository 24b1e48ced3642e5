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
  message?: string;
  stack?: string;
  storageErrors?: unknown;
  detail?: string;
  driverError?: { code?: string; message?: string; detail?: string };
}

/** body-parser's error types (express.json) and what they mean to the client. */
const BODY_PARSER_ERRORS: Record<string, [code: string, message: string, status: number]> = {
  'entity.parse.failed': ['bad-json', 'The request body is not valid JSON.', 400],
  'entity.too.large': ['too-large', 'The request is too large.', 413],
  'encoding.unsupported': ['unsupported-encoding', 'The request body uses an encoding the server does not read.', 415],
  'charset.unsupported': ['unsupported-encoding', 'The request body uses a character set the server does not read.', 415],
  'request.aborted': ['bad-request', 'The request body was cut off.', 400],
  'request.size.invalid': ['bad-request', 'The request body is shorter or longer than it says.', 400],
};

/**
 * A multipart body busboy could not read (no boundary, cut off mid-part, bad part headers): busboy
 * throws plain Errors, so recognise them by where they come from. Multer tags every error raised
 * while it reads a body with `storageErrors`; busboy's constructor throws before that.
 */
function isMultipartParseError(e: HttpishError): boolean {
  if (Array.isArray(e.storageErrors)) return true;
  const firstFrame = (e.stack ?? '').split('\n').find((line) => line.trimStart().startsWith('at '));
  if (firstFrame && /[\\/]node_modules[\\/](busboy|multer)[\\/]/.test(firstFrame)) return true;
  return /^(Multipart: |Unexpected end of (form|file)|Malformed (part|content))/i.test(e.message ?? '');
}

/** SQLite and PostgreSQL (23505) unique violations as a 409 naming the field, never a 500. */
function uniqueViolation(e: HttpishError): AppError | null {
  const driver = e.driverError ?? e;
  const code = driver.code ?? e.code;
  if (code !== 'SQLITE_CONSTRAINT_UNIQUE' && code !== 'SQLITE_CONSTRAINT_PRIMARYKEY' && code !== '23505') return null;
  // SQLite: "UNIQUE constraint failed: users.email"; PostgreSQL detail: "Key (email)=(…) already exists."
  const field = /constraint failed: \w+\.(\w+)/.exec(driver.message ?? '')?.[1] ?? /^Key \((\w+)\)=/.exec(driver.detail ?? '')?.[1];
  const message = field ? `Another record already has this ${field}.` : 'This would duplicate a record that already exists.';
  return new AppError('conflict', message, 409, field ? { field } : undefined);
}

/** Maps errors thrown by body parsers, multer and the database to our codes; everything unknown is a 500 with no detail. */
function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof z.ZodError) return validationError(err);
  const e = (err ?? {}) as HttpishError;
  const parserError = e.type ? BODY_PARSER_ERRORS[e.type] : undefined;
  if (parserError) return new AppError(...parserError);
  if (e.code === 'LIMIT_FILE_SIZE' || e.code === 'LIMIT_FIELD_VALUE') return new AppError('too-large', 'The request is too large.', 413);
  if (typeof e.code === 'string' && e.code.startsWith('LIMIT_')) return new AppError('bad-upload', 'The upload is malformed.', 400);
  if (isMultipartParseError(e)) return new AppError('bad-upload', 'The upload could not be read: the form data is malformed or cut off.', 400);
  const unique = uniqueViolation(e);
  if (unique) return unique;
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
