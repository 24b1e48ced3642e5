import { StyleSheet, View } from 'react-native';
import { Icon, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import type { LiveReadings } from './readings-draft';
import { asSentence, formatNumber } from './number-text';
import { listInWords, readingVerdictWords } from './reading-verdict';

function Tile({ label, value, note, testID }: { label: string; value: string; note?: string; testID: string }) {
  const theme = useTandemTheme();
  return (
    <View style={[styles.tile, { borderColor: theme.colors.outlineVariant, backgroundColor: theme.colors.surface }]}>
      <Text variant="labelLarge">{label}</Text>
      <Text variant="displaySmall" testID={testID}>
        {value}
      </Text>
      {note ? <Text variant="bodySmall">{note}</Text> : null}
    </View>
  );
}

const degrees = (v: number | undefined) => (v === undefined ? '—' : `${formatNumber(v)} °F`);

/** Superheat, subcooling, saturation temperatures, targets and the verdict, as they stand right now. */
export function ReadingsResult({ live, zeotropic }: { live: LiveReadings; zeotropic: boolean }) {
  const theme = useTandemTheme();
  const result = live.result;
  const { word, icon, tone } = readingVerdictWords(result?.verdict);
  const bg = { ok: theme.status.okContainer, caution: theme.status.cautionContainer, info: theme.status.infoContainer }[tone];
  const fg = { ok: theme.status.ok, caution: theme.status.caution, info: theme.status.info }[tone];
  const fixErrors = Object.keys(live.errors).length > 0;
  // The banner already says the verdict: drop a leading "On target:" from the advice.
  const advice = result
    ? asSentence(result.advice.replace(new RegExp(`^${word}:\\s*`, 'i'), ''))
    : fixErrors
      ? 'Fix the readings that have a message under them.'
      : `Still needed: ${listInWords(live.missing)}.`;
  const target = (v: number | undefined) => (v === undefined ? undefined : `Target ${formatNumber(v)} °F`);
  return (
    <View style={styles.stack} testID="readings-result">
      <View style={[styles.banner, { backgroundColor: bg, borderColor: fg }]} accessibilityRole="alert" accessibilityLiveRegion="polite">
        <Icon source={icon} size={36} color={fg} />
        <View style={styles.words}>
          <Text variant="headlineSmall" testID="reading-verdict">
            {word}
          </Text>
          <Text variant="bodyMedium" testID="reading-advice">
            {advice}
          </Text>
        </View>
      </View>
      <View style={styles.tiles}>
        <Tile label="Superheat" value={degrees(live.superheatF)} note={target(result?.targetSuperheatF)} testID="superheat" />
        <Tile label="Subcooling" value={degrees(live.subcoolingF)} note={target(result?.targetSubcoolingF)} testID="subcooling" />
        <Tile label={zeotropic ? 'Suction dew point' : 'Suction saturation'} value={degrees(live.suctionSatF)} testID="suction-sat" />
        <Tile label={zeotropic ? 'Liquid bubble point' : 'Liquid saturation'} value={degrees(live.liquidSatF)} testID="liquid-sat" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.md },
  banner: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, padding: spacing.lg, borderRadius: 14, borderWidth: 2 },
  words: { flex: 1, gap: 2 },
  tiles: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  tile: { flexGrow: 1, flexBasis: '40%', borderWidth: 1, borderRadius: 12, padding: spacing.md, gap: 2 },
});
