import { ScrollView, StyleSheet } from 'react-native';
import { CATALOG_KINDS, type CatalogKind } from '@/shared/schemas/equipment';
import { spacing } from '@/constants/theme';
import { ToggleChip } from '@/components/ui/toggle-chip';
import { KIND_LABELS } from './catalog-kind-labels';

const ICONS: Record<CatalogKind, string> = {
  'outdoor-units': 'hvac',
  'indoor-coils': 'radiator',
  'air-handlers': 'fan',
  'metering-devices': 'valve',
  'rated-combinations': 'certificate-outline',
};

/** The catalog's kinds as a row of chips (scrolls sideways on a phone); the shown kind is announced as pressed. */
export function KindSwitcher({ value, onChange }: { value: CatalogKind; onChange(kind: CatalogKind): void }) {
  return (
    <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row} style={styles.bar} role="group" aria-label="Kind of equipment">
      {CATALOG_KINDS.map((kind) => (
        <ToggleChip key={kind} icon={ICONS[kind]} label={KIND_LABELS[kind]} selected={kind === value} onPress={() => onChange(kind)} testID={`catalog-kind-${kind}`} />
      ))}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  bar: { flexGrow: 0, flexShrink: 0 },
  row: { gap: spacing.sm },
});
