import { StyleSheet, View } from 'react-native';
import { Icon, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import type { RuleSettings } from '@/shared/rules/types';
import type { TestVerdict } from '@/shared/commissioning';
import { SectionCard } from '@/components/ui/section-card';
import { evacuationOutcome, type EvacuationDraft, type EvacuationKey } from './evacuation-draft';
import { asSentence } from './number-text';
import { ReadingField } from './reading-field';

interface Props {
  draft: EvacuationDraft;
  settings: RuleSettings;
  altitudeFt: number;
  onChange(next: EvacuationDraft): void;
}

/** Passed / failed / not finished, by word and icon. */
function VerdictLine({ verdict, testID }: { verdict?: TestVerdict; testID: string }) {
  const theme = useTandemTheme();
  if (!verdict) return null;
  const look =
    verdict.pass === true
      ? { word: 'Passed', icon: 'check-circle', color: theme.status.ok }
      : verdict.pass === false
        ? { word: 'Failed', icon: 'close-octagon', color: theme.status.blocker }
        : { word: 'Not finished', icon: 'timer-sand', color: theme.status.info };
  return (
    <View style={styles.verdict} testID={testID}>
      <Icon source={look.icon} size={24} color={look.color} />
      <View style={styles.words}>
        <Text variant="titleMedium" testID={`${testID}-word`}>
          {look.word}
        </Text>
        <Text variant="bodyMedium">{asSentence(verdict.reason.replace(/^passed:\s*/i, ''))}</Text>
      </View>
    </View>
  );
}

/** Evacuation (final microns, decay test) and the standing nitrogen test, judged as they are typed. */
export function EvacuationSection({ draft, settings, altitudeFt, onChange }: Props) {
  const outcome = evacuationOutcome(draft, settings, altitudeFt);
  const field = (key: EvacuationKey, label: string, hint?: string) => (
    <ReadingField
      label={label}
      value={draft.values[key] ?? ''}
      onChangeText={(v) => onChange({ values: { ...draft.values, [key]: v } })}
      error={outcome.errors[key]}
      hint={hint}
      testID={`evac-${key}`}
    />
  );
  return (
    <SectionCard title="Evacuation and pressure test" testID="evacuation">
      <Text variant="titleSmall" role="heading" aria-level={3}>
        Vacuum
      </Text>
      <View style={styles.row}>
        {field('finalMicrons', 'Vacuum (microns)', `Deepest reached; shop target ${settings.evacuationTargetMicrons ?? 500} or lower.`)}
        {field('decayMicrons', 'After hold (microns)', `Pump isolated; shop limit under ${settings.decayLimitMicrons ?? 1000}.`)}
        {field('decayHoldMinutes', 'Hold (min)', `Shop hold: ${settings.decayHoldMinutes ?? 10} minutes.`)}
      </View>
      <VerdictLine verdict={outcome.evacuation} testID="evacuation-verdict" />
      <Text variant="titleSmall" role="heading" aria-level={3}>
        Nitrogen pressure test
      </Text>
      <View style={styles.row}>
        {field('testPsig', 'Nitrogen (psig)', 'Test pressure.')}
        {field('maxTestPsig', 'Allowed (psig)', 'Highest the unit’s installation instructions allow.')}
        {field('nitrogenHoldMinutes', 'Hold (min)')}
        {field('dropPsig', 'Drop (psi)', 'Over the hold; 0 when it held steady.')}
      </View>
      <VerdictLine verdict={outcome.pressureTest} testID="pressure-test-verdict" />
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  verdict: { flexDirection: 'row', gap: spacing.sm, alignItems: 'flex-start' },
  words: { flex: 1, gap: 2 },
});
