import { StyleSheet, View } from 'react-native';
import { Icon, Text } from 'react-native-paper';
import type { Finding } from '@/shared/rules/types';
import { spacing } from '@/constants/theme';
import { FindingRow } from './finding-row';
import { SEVERITY_GROUPS } from './verdict-words';

/** Findings grouped as Blockers, Cautions and Notes (empty groups left out). */
export function FindingGroups({ findings }: { findings: Finding[] }) {
  return (
    <View style={styles.groups}>
      {SEVERITY_GROUPS.map((g) => {
        const items = findings.filter((f) => f.severity === g.severity);
        if (!items.length) return null;
        return (
          <View key={g.severity} testID={`group-${g.severity}`}>
            <View style={styles.head}>
              <Icon source={g.icon} size={22} />
              <Text variant="titleMedium" accessibilityRole="header">
                {g.heading} ({items.length})
              </Text>
            </View>
            {items.map((f, i) => (
              <FindingRow key={`${f.ruleId}-${i}`} finding={f} />
            ))}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  groups: { gap: spacing.lg },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingVertical: spacing.xs },
});
