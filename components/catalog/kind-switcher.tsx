import { ScrollView, StyleSheet } from 'react-native';
import { Chip } from 'react-native-paper';
import { CATALOG_KINDS, type CatalogKind } from '@/shared/schemas/equipment';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { KIND_LABELS } from './catalog-kind-labels';

const ICONS: Record<CatalogKind, string> = {
  'outdoor-units': 'hvac',
  'indoor-coils': 'radiator',
  'air-handlers': 'fan',
  'metering-devices': 'valve',
  'rated-combinations': 'certificate-outline',
};

/** The catalog's kinds as a row of chips (scrolls sideways on a phone). */
export function KindSwitcher({ value, onChange }: { value: CatalogKind; onChange(kind: CatalogKind): void }) {
  return (
    <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row} style={styles.bar} accessibilityRole="tablist">
      {CATALOG_KINDS.map((kind) => (
        <Chip
          key={kind}
          icon={ICONS[kind]}
          selected={kind === value}
          showSelectedOverlay
          onPress={() => onChange(kind)}
          style={styles.chip}
          accessibilityRole="tab"
          accessibilityState={{ selected: kind === value }}
          testID={`catalog-kind-${kind}`}
        >
          {KIND_LABELS[kind]}
        </Chip>
      ))}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  bar: { flexGrow: 0, flexShrink: 0 },
  row: { gap: spacing.sm },
  chip: { minHeight: TOUCH_TARGET - 8, justifyContent: 'center' },
});
