import { ApiError, type FieldProblem } from './api-client';

/** One place that turns any error into words for the person holding the phone. */
export function errorText(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Something went wrong. Try again.';
  switch (error.kind) {
    case 'network':
      return 'No connection to the Tandem server. Check the signal and try again.';
    case 'unauthorized':
      return error.message || 'Sign in again to continue.';
    case 'forbidden':
      return 'Your role can not do this. Ask your office for access.';
    case 'not-found':
      return 'That was not found. It may have been removed.';
    case 'conflict':
      return error.message || 'Someone changed this at the same time. Reload and try again.';
    case 'rate-limited':
      return error.message || 'Too many attempts. Wait a few minutes.';
    case 'too-large':
      return 'That file is too large.';
    case 'unsupported-file':
      return error.message || 'That file type can not be read.';
    case 'validation':
      return fieldProblems(error).map((p) => (p.path ? `${p.path}: ${p.message}` : p.message)).join('\n') || error.message;
    case 'server':
      return 'The server had a problem. Try again in a moment.';
    default:
      return error.message;
  }
}

/** Field-level problems of a 422, when the server listed them. */
export function fieldProblems(error: ApiError): FieldProblem[] {
  return Array.isArray(error.details) ? (error.details as FieldProblem[]).filter((d) => typeof d?.message === 'string') : [];
}
