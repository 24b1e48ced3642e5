import { onlineManager, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { CheckRequest } from '@/shared/schemas/check';
import type { RulesSettingsResponse } from '@/shared/schemas/settings';
import { ApiError } from '@/hooks/api-client';
import { postCheck, useCheckMutation } from '@/hooks/use-checks';
import { ruleSettingsKeys } from '@/hooks/use-rule-settings';
import type { CheckOutcome, PickedPart } from './check-store';
import type { PartSlot } from './part-slots';
import { offlineContext, runOffline } from './run-offline';

export interface CheckInput {
  request: CheckRequest;
  picked: Partial<Record<PartSlot, PickedPart>>;
}

/**
 * Runs a check on the server; with no connection, the same shared engine on the device. `onDevice`
 * answers synchronously, for a screen that already knows it is offline (no request, no pending state);
 * the mutation falls back to it when a request fails or times out.
 */
export function useCheckRunner() {
  const client = useQueryClient();
  const onDevice = useCallback(
    ({ request, picked }: CheckInput): CheckOutcome => {
      const saved = client.getQueryData<RulesSettingsResponse>(ruleSettingsKeys.all);
      return { result: runOffline(request, picked, offlineContext(saved)), offline: true };
    },
    [client],
  );
  const mutation = useCheckMutation(async (input: CheckInput): Promise<CheckOutcome> => {
    if (!onlineManager.isOnline()) return onDevice(input);
    try {
      return { result: await postCheck(input.request), offline: false };
    } catch (err) {
      if (!(err instanceof ApiError) || err.kind !== 'network') throw err;
      return onDevice(input);
    }
  });
  return { mutation, onDevice };
}
