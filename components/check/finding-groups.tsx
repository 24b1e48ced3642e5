import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { isMissingFacts } from '@/shared/rules/define-rule';
import type { Finding, Severity } from '@/shared/rules/types';
import { spacing } from '@/constants/theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { FindingRow } from './finding-row';
import { SEVERITY_GROUPS } from './verdict-words';

/** One severity's findings under its heading ("Blockers (2)"); nothing when there are none. */
export function FindingGroup({ severity, findings }: { severity: Severity; findings: Finding[] }) {
  const g = SEVERITY_GROUPS.find((s) => s.severity === severity)!;
  const items = findings.filter((f) => f.severity === severity);
  if (!items.length) return null;
  return (
    <View testID={`group-${g.severity}`}>
      <View style={styles.head}>
        <DecorativeIcon source={g.icon} size={22} />
        <Text variant="titleMedium" role="heading" aria-level={2}>
          {g.heading} ({items.length})
        </Text>
      </View>
      {items.map((f, i) => (
        <FindingRow key={`${f.ruleId}-${i}`} finding={f} />
      ))}
    </View>
  );
}

/**
 * Blockers, cautions and notes in that order (screens without a Safety block between them). "Facts not
 * given" notes are left to the screen's Not checked block, as on the Check screen.
 */
export function FindingGroups({ findings: all }: { findings: Finding[] }) {
  const findings = all.filter((f) => !isMissingFacts(f));
  return (
    <>
      {SEVERITY_GROUPS.map((g) => (
        <FindingGroup key={g.severity} severity={g.severity} findings={findings} />
      ))}
    </>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingVertical: spacing.xs },
});
