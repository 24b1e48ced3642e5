import { StyleSheet, View } from 'react-native';
import { Button, Card, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useIsWide } from '@/hooks/use-layout';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { SwitchRow } from '@/components/ui/switch-row';
import { ToggleGroup } from '@/components/ui/toggle-group';
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
        <Text variant="titleMedium" role="heading" aria-level={2}>
          {info.title}
        </Text>
        <ToggleGroup
          label={`Where the ${info.title.toLowerCase().replace(' (optional)', '')} comes from`}
          showLabel={false}
          value={part.mode}
          onChange={(mode) => setPart(slot, { mode })}
          options={[
            { value: 'catalog', label: 'Catalog', testID: `${slot}-mode-catalog` },
            // A phone's half-width button holds only the short words.
            { value: 'typed', label: wide ? 'Type from nameplate' : 'From nameplate', testID: `${slot}-mode-typed` },
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
        {error ? (
          <Text style={{ color: theme.colors.error }} role="alert">
            ⚠ {error}
          </Text>
        ) : null}
        <SwitchRow label="Kept from the old system" value={part.kept} onChange={(kept) => setPart(slot, { kept })} testID={`${slot}-kept`} />
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  content: { gap: spacing.md },
  picked: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  flex: { flex: 1 },
  button: { minHeight: TOUCH_TARGET },
});
