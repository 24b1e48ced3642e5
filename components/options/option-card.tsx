import { StyleSheet, View } from 'react-native';
import { Button, Card, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import type { OptionLine, OptionView } from '@/shared/schemas/options';
import { verdictWords } from '@/components/check/verdict-words';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { MessageBanner } from '@/components/ui/message-banner';
import { moneyText, numberText, type FigureRow } from './option-words';

interface Props {
  option: OptionView;
  /** This card's place among the options (0-based) and how many there are. */
  index: number;
  count: number;
  rows: FigureRow[];
  differing: Set<string>;
  onEdit(): void;
  onChoose(): void;
  onMakeRecord(): void;
  onRemove(): void;
  busy: boolean;
}

const LINE_UNITS: Partial<Record<OptionLine['kind'], string>> = { 'line-set': 'ft', refrigerant: 'lb' };

/** One priced line: quantity × snapshot price, and today's price when it has moved since the save. */
function LineRow({ line }: { line: OptionLine }) {
  const theme = useTandemTheme();
  const unit = LINE_UNITS[line.kind] ?? '×';
  const qty = unit === '×' ? `${numberText(line.quantity, 2)} ×` : `${numberText(line.quantity, 2)} ${unit} ×`;
  return (
    <View style={styles.line}>
      <View style={styles.lineText}>
        <Text variant="bodyMedium">{line.model ? `${line.description} (${line.model})` : line.description}</Text>
        <Text variant="bodySmall">
          {`${qty} ${moneyText(line.unitPriceCents)} · ${line.priceSource === 'typed' ? 'typed' : `${line.distributor ?? 'price list'}${line.effectiveFrom ? `, from ${line.effectiveFrom}` : ''}`}`}
        </Text>
        {line.currentPriceDiffers && line.currentPrice ? (
          <View style={[styles.moved, { backgroundColor: theme.status.cautionContainer }]} testID="price-moved">
            <DecorativeIcon source="tag-arrow-right-outline" size={16} color={theme.colors.onSurface} />
            <Text variant="bodySmall">{`Today’s price differs: ${moneyText(line.currentPrice.priceCents)} at ${line.currentPrice.distributor}`}</Text>
          </View>
        ) : null}
      </View>
      <Text variant="bodyMedium" style={styles.amount}>
        {moneyText(line.extendedCents)}
      </Text>
    </View>
  );
}

/** An option's card: its figures (the differing ones marked), its priced lines and what can be done with it. */
export function OptionCard({ option, index, count, rows, differing, onEdit, onChoose, onMakeRecord, onRemove, busy }: Props) {
  const theme = useTandemTheme();
  const verdict = verdictWords(option.check);
  const tone = { ok: theme.status.ok, caution: theme.status.caution, blocker: theme.status.blocker, info: theme.status.info }[verdict.tone];
  return (
    <Card mode="outlined" style={[styles.card, option.chosen ? { borderColor: theme.colors.primary, borderWidth: 2 } : null]} testID={`option-card-${option.name}`}>
      <Card.Content style={styles.content}>
        <Text variant="labelMedium">{`Option ${index + 1} of ${count}`}</Text>
        <Text variant="titleLarge" role="heading" aria-level={3}>
          {option.name}
        </Text>
        {option.chosen ? (
          <View style={[styles.tag, { backgroundColor: theme.status.okContainer }]} testID="option-chosen">
            <DecorativeIcon source="account-check-outline" size={18} color={theme.colors.onSurface} />
            <Text variant="labelLarge">The customer chose this</Text>
          </View>
        ) : null}
        <View style={styles.verdict}>
          <DecorativeIcon source={verdict.icon} size={20} color={tone} />
          <Text variant="titleMedium">{verdict.word}</Text>
        </View>
        <Text variant="headlineSmall" testID="option-total">
          {moneyText(option.price.totalCents)}
        </Text>
        {option.energy.notComputed ? (
          <MessageBanner tone="info" testID="option-energy-missing">
            {`Yearly cooling cost and payback not worked out: ${option.energy.notComputed}.`}
          </MessageBanner>
        ) : null}
        <View style={styles.figures}>
          {rows.map((row) => {
            const marked = differing.has(row.key);
            return (
              <View key={row.key} style={[styles.figure, marked ? { backgroundColor: theme.colors.primaryContainer } : null]} testID={`figure-${row.key}`}>
                <View style={styles.figureLabel}>
                  <Text variant="labelMedium">{row.label}</Text>
                  {marked ? (
                    <Text variant="labelSmall" style={[styles.differs, { borderColor: theme.colors.primary }]} testID="differs">
                      differs
                    </Text>
                  ) : null}
                </View>
                <Text variant="bodyMedium" style={marked ? styles.bold : null}>
                  {row.values[index]}
                </Text>
              </View>
            );
          })}
        </View>
        <Text variant="titleSmall" role="heading" aria-level={4}>
          Priced lines
        </Text>
        {option.lines.length === 0 ? <Text variant="bodySmall">No lines.</Text> : option.lines.map((line, i) => <LineRow key={i} line={line} />)}
        {option.price.notes.map((n, i) => (
          <Text key={i} variant="bodySmall">
            {n}
          </Text>
        ))}
        <View style={styles.buttons}>
          <Button mode="outlined" icon="pencil-outline" onPress={onEdit} contentStyle={styles.button} testID="option-edit" accessibilityLabel={`Edit ${option.name}`}>
            Edit
          </Button>
          {!option.chosen ? (
            <Button mode="outlined" icon="account-check-outline" onPress={onChoose} disabled={busy} contentStyle={styles.button} testID="option-choose" accessibilityLabel={`The customer chose ${option.name}`}>
              Customer chose this
            </Button>
          ) : (
            <Button mode="contained" icon="clipboard-plus-outline" onPress={onMakeRecord} disabled={busy} contentStyle={styles.button} testID="option-make-record">
              Make this the system record
            </Button>
          )}
          <Button mode="text" icon="delete-outline" onPress={onRemove} disabled={busy} contentStyle={styles.button} testID="option-remove" accessibilityLabel={`Remove ${option.name}`}>
            Remove
          </Button>
        </View>
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flex: 1 },
  content: { gap: spacing.sm },
  tag: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, alignSelf: 'flex-start', paddingHorizontal: spacing.sm, paddingVertical: spacing.xs, borderRadius: 8 },
  verdict: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  figures: { gap: 2 },
  figure: { paddingVertical: spacing.xs, paddingHorizontal: spacing.xs, borderRadius: 6, gap: 1 },
  figureLabel: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  differs: { borderWidth: 1, borderRadius: 4, paddingHorizontal: 4 },
  bold: { fontFamily: 'Inter-SemiBold' },
  line: { flexDirection: 'row', gap: spacing.sm, alignItems: 'flex-start' },
  lineText: { flex: 1, gap: 2 },
  moved: { flexDirection: 'row', gap: spacing.xs, alignItems: 'center', paddingHorizontal: spacing.xs, borderRadius: 4, alignSelf: 'flex-start' },
  amount: { textAlign: 'right' },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  button: { minHeight: TOUCH_TARGET },
});
