import { useMutation } from '@tanstack/react-query';
import type { CheckResult } from '@/shared/rules/types';
import type { CheckRequest } from '@/shared/schemas/check';
import { apiRequest } from './api-client';

export const checkKeys = {
  all: ['checks'] as const,
};

/**
 * How long a check waits for the server before the phone answers by itself (ms). One bar of signal
 * can leave a request hanging; the server answers a check in well under a second when reachable.
 */
export const CHECK_SERVER_TIMEOUT_MS = 4000;

/** POST /api/checks (contract): the server resolves catalog parts and rated combinations. */
export function postCheck(body: CheckRequest, timeoutMs = CHECK_SERVER_TIMEOUT_MS): Promise<CheckResult> {
  // A timeout surfaces as a network error (not a cancel), so the caller falls back to the device.
  return apiRequest<CheckResult>('/checks', { method: 'POST', body, signal: AbortSignal.timeout(timeoutMs) });
}

/** A check as a mutation: each tap is a new answer, nothing to cache or persist; never paused offline. */
export function useCheckMutation<I, O>(run: (input: I) => Promise<O>) {
  return useMutation({ mutationKey: checkKeys.all, mutationFn: run, networkMode: 'always' });
}
