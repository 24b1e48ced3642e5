import { StyleSheet, View } from 'react-native';
import { Divider } from 'react-native-paper';
import { isMissingFacts } from '@/shared/rules/define-rule';
import { spacing } from '@/constants/theme';
import { useIsWide } from '@/hooks/use-layout';
import { SaveToJob } from '@/components/jobs/save-to-job';
import { MessageBanner } from '@/components/ui/message-banner';
import { SafetyNote } from '@/components/ui/safety-note';
import type { CheckOutcome } from './check-store';
import { ComputedBlock } from './computed-block';
import { CoverageBlock } from './coverage-block';
import { FindingGroup } from './finding-groups';
import { safetyPoints } from './safety-points';
import { VerdictBanner } from './verdict-banner';

export const OFFLINE_NOTE = 'Computed on this device — no connection. Rated-combination lookup skipped.';

/**
 * The answer, problems first: the verdict, the blockers, then Safety (one line on a phone until
 * opened), cautions and notes, the numbers, and what could not be checked for want of facts.
 */
export function CheckResultView({ outcome, systemRefrigerant }: { outcome: CheckOutcome; systemRefrigerant?: string }) {
  const wide = useIsWide();
  const { result, offline } = outcome;
  const safety = safetyPoints(result.findings, systemRefrigerant);
  // "Facts not given" notes are gathered under Not checked instead of reading as findings.
  const findings = result.findings.filter((f) => !isMissingFacts(f));
  return (
    <View style={styles.result} testID="check-result">
      <VerdictBanner result={result} />
      {offline ? (
        <MessageBanner tone="info" testID="offline-note">
          {OFFLINE_NOTE}
        </MessageBanner>
      ) : null}
      <FindingGroup severity="blocker" findings={findings} />
      {safety.length ? <SafetyNote points={safety} collapsed={!wide} /> : null}
      <FindingGroup severity="caution" findings={findings} />
      <FindingGroup severity="info" findings={findings} />
      <CoverageBlock coverage={result.coverage} />
      <Divider />
      <ComputedBlock computed={result.computed} />
      <SaveToJob />
    </View>
  );
}

const styles = StyleSheet.create({ result: { gap: spacing.lg } });
