import { StyleSheet, View } from 'react-native';
import { Button, Card, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { FormField } from '@/components/ui/form-field';
import { TIER_FIELDS, type ShopTierDraft } from './shop-settings-draft';

interface Props {
  tier: ShopTierDraft;
  index: number;
  errors: Record<string, string>;
  onChange(patch: Partial<ShopTierDraft>): void;
  onRemove(): void;
}

/** One rebate tier: its name and the minimum ratings an option must meet (at least one of them). */
export function RebateTierRow({ tier, index, errors, onChange, onRemove }: Props) {
  const title = tier.name.trim() || `Tier ${index + 1}`;
  return (
    <Card mode="outlined" testID={`tier-row-${index}`}>
      <Card.Content style={styles.content}>
        <View style={styles.head}>
          <Text variant="titleMedium" role="heading" aria-level={3} style={styles.title}>
            {title}
          </Text>
          <Button
            mode="text"
            icon="delete-outline"
            onPress={onRemove}
            contentStyle={styles.button}
            accessibilityLabel={`Remove ${title}`}
            testID={`tier-remove-${index}`}
          >
            Remove
          </Button>
        </View>
        <Text variant="bodySmall">Minimum ratings: give at least one of SEER2, EER2 and HSPF2.</Text>
        <View style={styles.grid}>
          {TIER_FIELDS.map((f) => (
            <FormField
              key={f.key}
              style={f.key === 'name' || f.key === 'note' ? styles.wide : styles.cell}
              label={f.short}
              accessibilityLabel={f.label}
              value={tier[f.key]}
              keyboardType={f.key === 'name' || f.key === 'note' ? 'default' : 'decimal-pad'}
              inputMode={f.key === 'name' || f.key === 'note' ? 'text' : 'decimal'}
              onChangeText={(v) => onChange({ [f.key]: v })}
              error={errors[`rebateTiers.${index}.${f.key}`]}
              testID={`tier-${index}-${f.key}`}
            />
          ))}
        </View>
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  content: { gap: spacing.sm },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  title: { flexShrink: 1 },
  button: { minHeight: TOUCH_TARGET },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 80, minWidth: 80 },
  wide: { flexGrow: 1, flexBasis: '100%' },
});
