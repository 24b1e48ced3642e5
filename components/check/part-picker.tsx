import { StyleSheet, View } from 'react-native';
import { Button, Card, SegmentedButtons, Switch, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useIsWide } from '@/hooks/use-layout';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { CatalogSearch } from './catalog-search';
import { setPart, useCheckForm } from './check-store';
import { NameplateForm } from './nameplate-form';
import { PART_INFO, type PartSlot } from './part-slots';

/** One part of the check: from the catalog or typed from the nameplate, and whether it stays from the old system. */
export function PartPicker({ slot }: { slot: PartSlot }) {
  const theme = useTandemTheme();
  const wide = useIsWide();
  const part = useCheckForm().parts[slot];
  const error = useCheckForm().errors[slot];
  const info = PART_INFO[slot];
  return (
    <Card mode="outlined" testID={`part-${slot}`}>
      <Card.Content style={styles.content}>
        <Text variant="titleMedium" accessibilityRole="header">
          {info.title}
        </Text>
        <SegmentedButtons
          value={part.mode}
          onValueChange={(mode) => setPart(slot, { mode: mode as 'catalog' | 'typed' })}
          buttons={[
            { value: 'catalog', label: 'Catalog', icon: wide ? 'magnify' : undefined, style: styles.segment, testID: `${slot}-mode-catalog` },
            // A phone's half-width button holds only the short words.
            { value: 'typed', label: wide ? 'Type from nameplate' : 'From nameplate', accessibilityLabel: 'Type from nameplate', icon: wide ? 'form-textbox' : undefined, style: styles.segment, testID: `${slot}-mode-typed` },
          ]}
        />
        {part.mode === 'catalog' && part.picked ? (
          <View style={styles.picked} testID={`${slot}-picked`}>
            <Text variant="bodyLarge" style={styles.flex}>
              ✓ {part.picked.label}
            </Text>
            <Button mode="outlined" onPress={() => setPart(slot, { picked: undefined })} contentStyle={styles.button}>
              {info.optional ? 'Remove' : 'Change'}
            </Button>
          </View>
        ) : null}
        {part.mode === 'catalog' && !part.picked ? <CatalogSearch slot={slot} onPick={(picked) => setPart(slot, { picked })} /> : null}
        {part.mode === 'typed' ? <NameplateForm slot={slot} /> : null}
        {part.mode === 'typed' && info.optional ? (
          <Button mode="text" icon="close" onPress={() => setPart(slot, { mode: 'catalog', picked: undefined })} contentStyle={styles.button}>
            Leave out the {info.title.toLowerCase().replace(' (optional)', '')}
          </Button>
        ) : null}
        {error ? <Text style={{ color: theme.colors.error }}>⚠ {error}</Text> : null}
        <View style={styles.kept}>
          <Text variant="bodyLarge" style={styles.flex} nativeID={`${slot}-kept-label`}>
            Kept from the old system
          </Text>
          <Switch value={part.kept} onValueChange={(kept) => setPart(slot, { kept })} accessibilityLabelledBy={`${slot}-kept-label`} accessibilityLabel={`${info.title} kept from the old system`} testID={`${slot}-kept`} />
        </View>
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  content: { gap: spacing.md },
  segment: { minHeight: TOUCH_TARGET },
  picked: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  flex: { flex: 1 },
  button: { minHeight: TOUCH_TARGET },
  kept: { flexDirection: 'row', alignItems: 'center', minHeight: TOUCH_TARGET, gap: spacing.sm },
});
