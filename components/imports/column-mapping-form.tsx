import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, Menu, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import type { HeaderProblem } from '@/hooks/use-imports';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { ToggleChip } from '@/components/ui/toggle-chip';
import { fieldLabel } from './import-labels';

interface Props {
  problem: HeaderProblem;
  distributor?: string;
  busy: boolean;
  onRetry(mapping: Record<string, string>): void;
}

function FieldMenu({ column, value, fields, onChange }: { column: string; value?: string; fields: string[]; onChange(field?: string): void }) {
  const [open, setOpen] = useState(false);
  const pick = (field?: string) => {
    setOpen(false);
    onChange(field);
  };
  return (
    <Menu
      visible={open}
      onDismiss={() => setOpen(false)}
      anchor={
        <Button mode="outlined" icon="menu-down" contentStyle={styles.touch} onPress={() => setOpen(true)} testID={`map-${column}`}>
          {value ? fieldLabel(value) : 'Not used'}
        </Button>
      }
    >
      <Menu.Item title="Not used" leadingIcon={value ? undefined : 'check'} onPress={() => pick(undefined)} />
      {fields.map((f) => (
        <Menu.Item key={f} title={fieldLabel(f)} leadingIcon={value === f ? 'check' : undefined} onPress={() => pick(f)} testID={`map-${column}-${f}`} />
      ))}
    </Menu>
  );
}

/** Up to this many fields show as chips (all visible, one tap); more go in a menu. */
const CHIP_LIMIT = 8;

function FieldChips({ column, value, fields, onChange }: { column: string; value?: string; fields: string[]; onChange(field?: string): void }) {
  return (
    <View style={styles.chips} role="group" aria-label={`Column “${column}”`}>
      <ToggleChip label="Not used" selected={!value} onPress={() => onChange(undefined)} testID={`map-${column}-none`} />
      {fields.map((f) => (
        <ToggleChip key={f} label={fieldLabel(f)} selected={value === f} onPress={() => onChange(f)} testID={`map-${column}-${f}`} />
      ))}
    </View>
  );
}

/** The file's headers did not match: the admin says which column is which, then uploads again. */
export function ColumnMappingForm({ problem, distributor, busy, onRetry }: Props) {
  const theme = useTandemTheme();
  const [mapping, setMapping] = useState<Record<string, string>>({});
  const chosen = new Set(Object.values(mapping));
  const stillMissing = problem.missingFields.filter((f) => !chosen.has(f));
  const set = (column: string, field?: string) =>
    setMapping((m) => {
      const next = Object.fromEntries(Object.entries(m).filter(([c, f]) => c !== column && f !== field));
      return field ? { ...next, [column]: field } : next;
    });

  return (
    <Card mode="outlined" testID="column-mapping">
      <Card.Content style={styles.gap}>
        <Text variant="titleLarge" role="heading" aria-level={2}>
          Match the columns
        </Text>
        <Text variant="bodyMedium">
          Tandem could not tell which column holds {problem.missingFields.map(fieldLabel).join(' and ').toLowerCase()}. Say what each column of
          the file holds{distributor ? `; Tandem remembers it for ${distributor}'s next file` : ''}.
        </Text>
        {problem.foundColumns.map((column) => (
          <View key={column} style={[styles.row, { borderBottomColor: theme.colors.outlineVariant }]}>
            <Text variant="bodyLarge" style={styles.column}>
              {column}
            </Text>
            {problem.knownFields.length <= CHIP_LIMIT ? (
              <FieldChips column={column} value={mapping[column]} fields={problem.knownFields} onChange={(f) => set(column, f)} />
            ) : (
              <FieldMenu column={column} value={mapping[column]} fields={problem.knownFields} onChange={(f) => set(column, f)} />
            )}
          </View>
        ))}
        {stillMissing.length > 0 ? (
          <Text variant="bodyMedium" testID="mapping-missing">
            Still needed: {stillMissing.map(fieldLabel).join(', ')}.
          </Text>
        ) : null}
        <Button
          mode="contained"
          icon="table-arrow-right"
          disabled={stillMissing.length > 0 || busy}
          loading={busy}
          onPress={() => onRetry(mapping)}
          contentStyle={styles.touch}
          testID="mapping-retry"
        >
          Check the file again
        </Button>
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  gap: { gap: spacing.md },
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm, paddingVertical: spacing.xs, borderBottomWidth: StyleSheet.hairlineWidth },
  column: { flex: 1, minWidth: 120 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  touch: { minHeight: TOUCH_TARGET },
});
