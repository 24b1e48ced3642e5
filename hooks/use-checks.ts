import { useMutation } from '@tanstack/react-query';
import type { CheckResult } from '@/shared/rules/types';
import type { CheckRequest } from '@/shared/schemas/check';
import { api } from './api-client';

export const checkKeys = {
  all: ['checks'] as const,
};

/** POST /api/checks (contract): the server resolves catalog parts and rated combinations. */
export function postCheck(body: CheckRequest): Promise<CheckResult> {
  return api.post<CheckResult>('/checks', body);
}

/** A check as a mutation: each tap is a new answer, nothing to cache or persist. */
export function useCheckMutation<I, O>(run: (input: I) => Promise<O>) {
  return useMutation({ mutationKey: checkKeys.all, mutationFn: run });
}
