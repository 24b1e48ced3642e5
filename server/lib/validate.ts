import { z } from 'zod';
import { AppError, validationError } from './errors';

/** Parses a request body with a shared schema; a failure is a 422 listing each field path. */
export function parseBody<T extends z.ZodType>(schema: T, body: unknown): z.infer<T> {
  // Only a body no parser read is undefined here (see defaultEmptyBody): e.g. form data sent to a JSON route.
  if (body === undefined) throw new AppError('unsupported-media-type', 'Send the data as JSON.', 415);
  const result = schema.safeParse(body);
  if (!result.success) throw validationError(result.error);
  return result.data;
}

/** Parses query or path parameters; a failure is a 400 (bad parameters, DESIGN.md §5). */
export function parseParams<T extends z.ZodType>(schema: T, params: unknown): z.infer<T> {
  const result = schema.safeParse(params);
  if (!result.success) {
    const details = result.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    throw new AppError('bad-parameters', 'The request parameters are not valid.', 400, details);
  }
  return result.data;
}

/**
 * A record id in a path: only the canonical spelling of a positive integer ("22", never "022",
 * "0x16", "1e1", " 22", "22.0" or "-1"), so one item has one address and nothing coerces into another.
 */
export const CanonicalIdSchema = z
  .string()
  .regex(/^[1-9][0-9]{0,15}$/, { error: 'Expected a positive whole number.' })
  .transform(Number)
  .refine(Number.isSafeInteger, { error: 'Expected a positive whole number.' });

/** `{ id }` path parameters for every router (users, catalog, imports). */
export const IdParamSchema = z.object({ id: CanonicalIdSchema });
