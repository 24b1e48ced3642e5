import { z } from 'zod';
import { AppError, validationError } from './errors';

/** Parses a request body with a shared schema; a failure is a 422 listing each field path. */
export function parseBody<T extends z.ZodType>(schema: T, body: unknown): z.infer<T> {
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

export const IdParamSchema = z.object({ id: z.coerce.number().int().positive() });
