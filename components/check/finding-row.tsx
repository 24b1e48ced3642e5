import { StyleSheet, View } from 'react-native';
import { List, Text } from 'react-native-paper';
import type { Finding } from '@/shared/rules/types';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { valueLabel } from './value-label';
import { BASIS_WORDS, SEVERITY_GROUPS } from './verdict-words';

const shown = (v: unknown) => (v === null || v === undefined || v === '' ? null : typeof v === 'boolean' ? (v ? 'yes' : 'no') : String(v));

/** One finding: its title closed; open, its numbers, the fix and the basis. */
export function FindingRow({ finding }: { finding: Finding }) {
  const theme = useTandemTheme();
  const group = SEVERITY_GROUPS.find((g) => g.severity === finding.severity)!;
  const colour = { blocker: theme.status.blocker, caution: theme.status.caution, info: theme.status.info }[finding.severity];
  const values = Object.entries(finding.values).filter(([, v]) => shown(v) !== null);
  return (
    <List.Accordion
      title={finding.title}
      titleNumberOfLines={3}
      description={`${group.word} · ${finding.ruleId}`}
      left={(p) => <List.Icon {...p} icon={group.icon} color={colour} />}
      style={styles.header}
      testID={`finding-${finding.ruleId}`}
    >
      <View style={styles.body} testID={`finding-detail-${finding.ruleId}`}>
        <Text variant="bodyLarge">{finding.detail}</Text>
        {finding.fix ? (
          <View style={styles.block}>
            <Text variant="labelLarge">What to do</Text>
            <Text variant="bodyLarge" testID={`finding-fix-${finding.ruleId}`}>
              {finding.fix}
            </Text>
          </View>
        ) : null}
        <View style={styles.block}>
          <Text variant="labelLarge">Basis</Text>
          <Text variant="bodyMedium">
            {BASIS_WORDS[finding.basis.kind]}: {finding.basis.citation}
          </Text>
        </View>
        {values.length ? (
          <View style={styles.block}>
            <Text variant="labelLarge">Values used</Text>
            {values.map(([k, v]) => (
              <Text key={k} variant="bodySmall">
                {valueLabel(k)}: {shown(v)}
              </Text>
            ))}
          </View>
        ) : null}
      </View>
    </List.Accordion>
  );
}

const styles = StyleSheet.create({
  header: { minHeight: 56 },
  body: { gap: spacing.md, paddingHorizontal: spacing.lg, paddingBottom: spacing.lg },
  block: { gap: 2 },
});
