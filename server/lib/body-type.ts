import type { Request, RequestHandler } from 'express';
import { AppError } from './errors';

/** The API reads JSON everywhere and multipart form data for uploads; nothing else. */
const BODY_TYPES = ['application/json', 'multipart/form-data'];

/** A body the client actually sent (an empty POST with Content-Length: 0 is no body). */
function sendsBody(req: Request): boolean {
  return req.headers['transfer-encoding'] !== undefined || Number(req.headers['content-length'] ?? 0) > 0;
}

/** Refuses a body in any other type with a 415 before a parser skips it silently. */
export const requireKnownBodyType: RequestHandler = (req, _res, next) => {
  if (sendsBody(req) && !req.is(BODY_TYPES)) {
    throw new AppError('unsupported-media-type', 'Send the data as JSON (or a file upload as form data).', 415);
  }
  next();
};

/**
 * After express.json: a request with no body reads as `{}`, so its schema names the missing fields
 * (422); a multipart body stays unread for the route's upload parser, and a JSON route that gets one
 * sees `undefined` (parseBody answers 415).
 */
export const defaultEmptyBody: RequestHandler = (req, _res, next) => {
  if (req.body === undefined && !req.is('multipart/form-data')) req.body = {};
  next();
};
