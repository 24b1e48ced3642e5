import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import type { Finding } from '@/shared/rules/types';
import { MIN_TARGET_PX, spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { citationWords } from './rule-words';
import { valueLabel } from './value-label';
import { isInternalKey, valueWords } from './value-words';
import { BASIS_WORDS, findingTitle, SEVERITY_GROUPS } from './verdict-words';

/** One finding: what is wrong and the fix under it; a tap opens the numbers and the basis. */
export function FindingRow({ finding }: { finding: Finding }) {
  const theme = useTandemTheme();
  const [open, setOpen] = useState(false);
  const group = SEVERITY_GROUPS.find((g) => g.severity === finding.severity)!;
  const colour = { blocker: theme.status.blocker, caution: theme.status.caution, info: theme.status.info }[finding.severity];
  const values = Object.entries(finding.values)
    .filter(([k]) => !isInternalKey(k))
    .map(([k, v]) => [valueLabel(k), valueWords(k, v)] as const)
    .filter(([, v]) => v !== null);
  const supportIds = [finding.ruleId, ...Object.entries(finding.values).filter(([k, v]) => isInternalKey(k) && k !== 'missing' && v).map(([, v]) => String(v))];
  return (
    <View style={[styles.row, { borderLeftColor: colour }]}>
      <Pressable
        onPress={() => setOpen(!open)}
        accessibilityRole="button"
        aria-expanded={open}
        accessibilityHint={open ? 'Hides the details' : 'Shows the numbers and the basis'}
        style={styles.header}
        testID={`finding-${finding.ruleId}`}
      >
        <DecorativeIcon source={group.icon} size={22} color={colour} />
        <View style={styles.words}>
          <Text variant="titleMedium" testID={`finding-title-${finding.ruleId}`}>
            {findingTitle(finding)}
          </Text>
          {finding.fix ? (
            <Text variant="bodyMedium" testID={`finding-fix-${finding.ruleId}`}>
              {finding.fix}
            </Text>
          ) : null}
        </View>
        <DecorativeIcon source={open ? 'chevron-up' : 'chevron-down'} size={24} color={theme.colors.onSurfaceVariant} />
      </Pressable>
      {open ? (
        <View style={styles.body} testID={`finding-detail-${finding.ruleId}`}>
          <Text variant="bodyLarge">{finding.detail}</Text>
          {values.length ? (
            <View style={styles.block}>
              <Text variant="labelLarge">Values used</Text>
              {values.map(([label, v]) => (
                <Text key={label} variant="bodyMedium">
                  {label}: {v}
                </Text>
              ))}
            </View>
          ) : null}
          <View style={styles.block}>
            <Text variant="labelLarge">Basis</Text>
            <Text variant="bodyMedium">
              {BASIS_WORDS[finding.basis.kind]}: {citationWords(finding.basis.citation)}
            </Text>
          </View>
          {/* The one place an internal id may appear: for someone helping the tech on the phone. */}
          <Text variant="bodySmall" style={{ color: theme.colors.onSurfaceVariant }} testID={`finding-support-${finding.ruleId}`}>
            Details for support: {supportIds.join(', ')}
          </Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { borderLeftWidth: 4, borderRadius: 4, marginBottom: spacing.sm },
  header: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.md, minHeight: MIN_TARGET_PX, paddingVertical: spacing.sm, paddingHorizontal: spacing.md },
  words: { flex: 1, gap: 2 },
  body: { gap: spacing.md, paddingHorizontal: spacing.md, paddingLeft: spacing.md + 22 + spacing.md, paddingBottom: spacing.md },
  block: { gap: 2 },
});
