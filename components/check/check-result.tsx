import { StyleSheet, View } from 'react-native';
import { Divider } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { SaveToJob } from '@/components/jobs/save-to-job';
import { MessageBanner } from '@/components/ui/message-banner';
import { SafetyNote } from '@/components/ui/safety-note';
import type { CheckOutcome } from './check-store';
import { ComputedBlock } from './computed-block';
import { CoverageBlock } from './coverage-block';
import { FindingGroups } from './finding-groups';
import { safetyPoints } from './safety-points';
import { VerdictBanner } from './verdict-banner';

export const OFFLINE_NOTE = 'Computed on this device — no connection. Rated-combination lookup skipped.';

/** The answer: verdict, how it was computed, safety, findings by severity, numbers and coverage. */
export function CheckResultView({ outcome, systemRefrigerant }: { outcome: CheckOutcome; systemRefrigerant?: string }) {
  const { result, offline } = outcome;
  const safety = safetyPoints(result.findings, systemRefrigerant);
  return (
    <View style={styles.result} testID="check-result">
      <VerdictBanner result={result} />
      {offline ? (
        <MessageBanner tone="info" testID="offline-note">
          {OFFLINE_NOTE}
        </MessageBanner>
      ) : null}
      {safety.length ? <SafetyNote points={safety} /> : null}
      <FindingGroups findings={result.findings} />
      <Divider />
      <ComputedBlock computed={result.computed} />
      <CoverageBlock coverage={result.coverage} />
      <SaveToJob />
    </View>
  );
}

const styles = StyleSheet.create({ result: { gap: spacing.lg } });
