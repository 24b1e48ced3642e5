import type { z } from 'zod';
import { CheckRequestSchema, type CheckRequest } from '../../shared/schemas/check';
import { AppError } from '../lib/errors';

interface Problem {
  path: string;
  message: string;
}

/**
 * Validates a check body. A part is a union ({ id } or { spec }); zod reports a failed union as one
 * issue at the part, so this reports the branch the caller meant, with its own field paths.
 */
export function parseCheckRequest(body: unknown): CheckRequest {
  const result = CheckRequestSchema.safeParse(body);
  if (result.success) return result.data;
  const details = result.error.issues.flatMap((issue) => problemsOf(issue, body));
  throw new AppError('validation-failed', 'The request did not pass validation.', 422, details);
}

function problemsOf(issue: z.core.$ZodIssue, body: unknown, prefix: PropertyKey[] = []): Problem[] {
  const path = [...prefix, ...issue.path];
  if (issue.code !== 'invalid_union' || issue.errors.length !== 2) return [{ path: path.join('.'), message: issue.message }];
  const part = valueAt(body, path);
  const hasId = isObject(part) && 'id' in part;
  const hasSpec = isObject(part) && 'spec' in part;
  if (hasId && hasSpec) return [{ path: path.join('.'), message: 'give either id (a catalog part) or spec (typed from a nameplate), not both' }];
  if (!hasId && !hasSpec) return [{ path: path.join('.'), message: 'expected { id } of a catalog part or { spec } typed from a nameplate' }];
  const branch = issue.errors[hasId ? 0 : 1];
  return branch.flatMap((inner) => problemsOf(inner, body, path));
}

function valueAt(value: unknown, path: PropertyKey[]): unknown {
  let v = value;
  for (const key of path) v = isObject(v) ? (v as Record<PropertyKey, unknown>)[key] : undefined;
  return v;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null;
