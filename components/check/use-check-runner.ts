import { onlineManager, useQueryClient } from '@tanstack/react-query';
import type { CheckRequest } from '@/shared/schemas/check';
import type { RulesSettingsResponse } from '@/shared/schemas/settings';
import { ApiError } from '@/hooks/api-client';
import { postCheck, useCheckMutation } from '@/hooks/use-checks';
import { ruleSettingsKeys } from '@/hooks/use-rule-settings';
import type { CheckOutcome, PickedPart } from './check-store';
import type { PartSlot } from './part-slots';
import { offlineContext, runOffline } from './run-offline';

interface Input {
  request: CheckRequest;
  picked: Partial<Record<PartSlot, PickedPart>>;
}

/**
 * Runs a check on the server; with no connection, the same shared engine on the device — at once
 * when the app already knows it is offline, never after waiting on a request that can not succeed.
 */
export function useCheckRunner() {
  const client = useQueryClient();
  return useCheckMutation(async ({ request, picked }: Input): Promise<CheckOutcome> => {
    const onDevice = (): CheckOutcome => {
      const saved = client.getQueryData<RulesSettingsResponse>(ruleSettingsKeys.all);
      return { result: runOffline(request, picked, offlineContext(saved)), offline: true };
    };
    if (!onlineManager.isOnline()) return onDevice();
    try {
      return { result: await postCheck(request), offline: false };
    } catch (err) {
      if (!(err instanceof ApiError) || err.kind !== 'network') throw err;
      return onDevice();
    }
  });
}
