/**
 * The app's one fetch boundary: attaches the session token, parses JSON, and turns every failure
 * into an ApiError with a small set of kinds the screens can act on.
 */

export type ApiErrorKind =
  | 'network'
  | 'unauthorized'
  | 'forbidden'
  | 'not-found'
  | 'conflict'
  | 'validation'
  | 'too-large'
  | 'unsupported-file'
  | 'rate-limited'
  | 'bad-request'
  | 'server';

export interface FieldProblem {
  path?: string;
  message: string;
  [key: string]: unknown;
}

export class ApiError extends Error {
  constructor(
    readonly kind: ApiErrorKind,
    message: string,
    readonly status: number,
    readonly code: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

function kindForStatus(status: number): ApiErrorKind {
  if (status === 401) return 'unauthorized';
  if (status === 403) return 'forbidden';
  if (status === 404) return 'not-found';
  if (status === 409) return 'conflict';
  if (status === 413) return 'too-large';
  if (status === 415) return 'unsupported-file';
  if (status === 422) return 'validation';
  if (status === 429) return 'rate-limited';
  if (status >= 500) return 'server';
  return 'bad-request';
}

/** Same origin in production; `npm run dev` points the Expo dev server at the API. */
const API_BASE = `${process.env.EXPO_PUBLIC_API_URL ?? ''}/api`;

let token: string | null = null;
let onUnauthorized: (() => void) | null = null;
let outcomeListener: ((reached: boolean) => void) | null = null;

/** The connection tracker hears whether each request reached the server (hooks/connection.ts). */
export function onRequestOutcome(listener: (reached: boolean) => void) {
  outcomeListener = listener;
}

/** True when GET /api/health answers within a few seconds. */
export async function pingServer(timeoutMs = 5000): Promise<boolean> {
  try {
    const response = await fetch(`${API_BASE}/health`, { signal: AbortSignal.timeout(timeoutMs), cache: 'no-store' });
    outcomeListener?.(true);
    return response.ok;
  } catch {
    return false;
  }
}

/** The session module sets the token and what to do when the server says 401. */
export function configureApiClient(options: { token: string | null; onUnauthorized?: () => void }) {
  token = options.token;
  if (options.onUnauthorized) onUnauthorized = options.onUnauthorized;
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
  /** Sign-in itself must not bounce to sign-in on 401. */
  skipAuthRedirect?: boolean;
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (token) headers.Authorization = `Bearer ${token}`;
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) body = options.body;
  else if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body);
  }

  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, { method: options.method ?? 'GET', headers, body, signal: options.signal });
  } catch (err) {
    // A query cancelled by the app says nothing about the network; a timeout does.
    if ((err as Error)?.name === 'AbortError') throw err;
    outcomeListener?.(false);
    throw new ApiError('network', 'Tandem can not reach the server.', 0, 'network');
  }
  outcomeListener?.(true);

  const text = await response.text();
  let json: unknown = undefined;
  if (text) {
    try {
      json = JSON.parse(text);
    } catch {
      json = undefined;
    }
  }
  if (!response.ok) {
    const error = (json as { error?: { code?: string; message?: string; details?: unknown } } | undefined)?.error;
    const kind = kindForStatus(response.status);
    if (kind === 'unauthorized' && !options.skipAuthRedirect) onUnauthorized?.();
    throw new ApiError(kind, error?.message ?? `The server answered ${response.status}.`, response.status, error?.code ?? kind, error?.details);
  }
  return json as T;
}

/** Fetches a file (CSV, PDF) with the session token; a plain link would carry none. */
export async function apiBlob(path: string): Promise<Blob> {
  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  } catch {
    outcomeListener?.(false);
    throw new ApiError('network', 'Tandem can not reach the server.', 0, 'network');
  }
  if (!response.ok) {
    const kind = kindForStatus(response.status);
    if (kind === 'unauthorized') onUnauthorized?.();
    throw new ApiError(kind, `The file could not be fetched (${response.status}).`, response.status, kind);
  }
  return response.blob();
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  post: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'POST', body }),
  patch: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'PATCH', body }),
};

/** Builds a query string from defined values only. */
export function queryString(params: Record<string, string | number | boolean | undefined | null>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== null && value !== '') search.set(key, String(value));
  }
  const s = search.toString();
  return s ? `?${s}` : '';
}
