import { Pressable, StyleSheet, View } from 'react-native';
import { Icon, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import type { CompatibleCoil } from '@/shared/schemas/coils';
import { verdictWords } from '@/components/check/verdict-words';
import { coilTons, configurationWord, materialWord, priceText, ratedSeer2 } from './coil-words';

interface Props {
  item: CompatibleCoil;
  wide: boolean;
  open: boolean;
  onPress(): void;
}

/** One coil: a card on a phone, a table row on a wide screen; tapping opens its detail. */
export function CoilRow({ item, wide, open, onPress }: Props) {
  const theme = useTandemTheme();
  const verdict = verdictWords(item);
  const tone = { ok: theme.status.ok, caution: theme.status.caution, blocker: theme.status.blocker, info: theme.status.info }[verdict.tone];
  const verdictCell = (
    <View style={styles.verdict}>
      <Icon source={verdict.icon} size={20} color={tone} />
      <Text variant="bodyMedium">{verdict.word}</Text>
    </View>
  );
  const label = `${item.coil.model}, ${verdict.word}, ${priceText(item)}. ${open ? 'Hide' : 'Show'} details`;
  return (
    <Pressable
      onPress={onPress}
      accessibilityRole="button"
      accessibilityLabel={label}
      accessibilityState={{ expanded: open }}
      testID={`coil-row-${item.coil.model}`}
      style={[styles.row, wide ? styles.wideRow : styles.card, { borderColor: theme.colors.outlineVariant, backgroundColor: open ? theme.colors.surfaceVariant : theme.colors.surface }]}
    >
      {wide ? (
        <>
          <Text variant="titleSmall" style={styles.model}>
            {item.coil.model}
          </Text>
          <Text style={styles.cell}>{coilTons(item)}</Text>
          <Text style={styles.cell}>{materialWord(item.coil.material)}</Text>
          <Text style={styles.cell}>{configurationWord(item.coil.configuration)}</Text>
          <View style={styles.cellWide}>{verdictCell}</View>
          <Text style={styles.cell}>{ratedSeer2(item)}</Text>
          <Text style={[styles.cell, styles.price]}>{priceText(item)}</Text>
        </>
      ) : (
        <View style={styles.stack}>
          <View style={styles.line}>
            <Text variant="titleMedium">{item.coil.model}</Text>
            <Text variant="titleMedium">{priceText(item)}</Text>
          </View>
          {verdictCell}
          <Text variant="bodySmall">
            {[coilTons(item), materialWord(item.coil.material), configurationWord(item.coil.configuration), ratedSeer2(item)].join(' · ')}
          </Text>
        </View>
      )}
    </Pressable>
  );
}

/** Column headings of the wide table, in the row's order. */
export function CoilTableHeader() {
  const theme = useTandemTheme();
  return (
    <View style={[styles.wideRow, styles.header, { borderColor: theme.colors.outline }]}>
      {['Model', 'Tons', 'Material', 'Configuration', 'Verdict', 'Rated', 'Best price'].map((h, i) => (
        <Text key={h} variant="labelLarge" style={i === 0 ? styles.model : i === 4 ? styles.cellWide : i === 6 ? [styles.cell, styles.price] : styles.cell}>
          {h}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: TOUCH_TARGET },
  card: { borderWidth: 1, borderRadius: 12, padding: spacing.md },
  wideRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingHorizontal: spacing.md, paddingVertical: spacing.sm, borderBottomWidth: 1 },
  header: { borderBottomWidth: 2 },
  stack: { gap: spacing.xs },
  line: { flexDirection: 'row', justifyContent: 'space-between', gap: spacing.sm, flexWrap: 'wrap' },
  verdict: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  model: { flex: 2 },
  cell: { flex: 1 },
  cellWide: { flex: 2 },
  price: { textAlign: 'right' },
});
