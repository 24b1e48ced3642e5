import { StyleSheet, View } from 'react-native';
import { Icon, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import type { LiveReadings } from './readings-draft';
import { formatNumber } from './number-text';
import { readingVerdictWords } from './reading-verdict';

/** Phone only: superheat, subcooling and the verdict pinned above the form, in view while typing. */
export function ReadingsStrip({ live }: { live: LiveReadings }) {
  const theme = useTandemTheme();
  const { word, icon, tone } = readingVerdictWords(live.result?.verdict);
  const fg = { ok: theme.status.ok, caution: theme.status.caution, info: theme.status.info }[tone];
  const value = (v: number | undefined) => (v === undefined ? '—' : `${formatNumber(v)} °F`);
  return (
    <View
      style={[styles.strip, { backgroundColor: theme.colors.surface, borderColor: theme.colors.outlineVariant }]}
      testID="readings-strip"
    >
      <View style={styles.cell}>
        <Text variant="labelSmall">Superheat</Text>
        <Text variant="titleLarge" testID="strip-superheat">
          {value(live.superheatF)}
        </Text>
      </View>
      <View style={styles.cell}>
        <Text variant="labelSmall">Subcooling</Text>
        <Text variant="titleLarge" testID="strip-subcooling">
          {value(live.subcoolingF)}
        </Text>
      </View>
      <View style={[styles.cell, styles.verdict]}>
        <Icon source={icon} size={22} color={fg} />
        <Text variant="titleSmall" style={styles.word} testID="strip-verdict">
          {word}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  strip: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
    borderBottomWidth: 1,
  },
  cell: { flex: 1, gap: 0 },
  verdict: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, flex: 1.3 },
  word: { flexShrink: 1 },
});
