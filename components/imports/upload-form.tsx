import { StyleSheet, View } from 'react-native';
import { Button, Chip, Text } from 'react-native-paper';
import { IMPORT_KINDS, type ImportKind } from '@/shared/schemas/equipment';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { FormField } from '@/components/ui/form-field';
import type { DecimalConvention } from '@/hooks/use-imports';
import { DECIMAL_CHOICES, IMPORT_KIND_LABELS } from './import-labels';
import type { PickedFile } from './pick-csv';

export interface UploadChoice {
  kind: ImportKind;
  distributor: string;
  picked: PickedFile | null;
  /** Price files: how amounts are written; 'auto' reads it from the file. */
  decimal: 'auto' | DecimalConvention;
}

interface Props {
  value: UploadChoice;
  knownDistributors: string[];
  busy: boolean;
  onChange(next: UploadChoice): void;
  onPick(): void;
  onSubmit(): void;
}

/** What to upload: the kind of file, the distributor (prices only) and the file itself. */
export function UploadForm({ value, knownDistributors, busy, onChange, onPick, onSubmit }: Props) {
  const needsDistributor = value.kind === 'prices';
  const ready = value.picked !== null && (!needsDistributor || value.distributor.trim() !== '');
  return (
    <View style={styles.gap} testID="upload-form">
      <Text variant="labelLarge">What the file holds</Text>
      <View style={styles.chips}>
        {IMPORT_KINDS.map((k) => (
          <Chip key={k} selected={value.kind === k} showSelectedOverlay onPress={() => onChange({ ...value, kind: k })} style={styles.chip} testID={`import-kind-${k}`}>
            {IMPORT_KIND_LABELS[k]}
          </Chip>
        ))}
      </View>
      {needsDistributor ? (
        <View style={styles.gap}>
          <FormField
            label="Distributor"
            value={value.distributor}
            onChangeText={(t) => onChange({ ...value, distributor: t })}
            hint="Who the price list comes from. Type a new name or pick one below."
            testID="import-distributor"
          />
          {knownDistributors.length > 0 ? (
            <View style={styles.chips}>
              {knownDistributors.map((d) => (
                <Chip key={d} icon="store-outline" selected={value.distributor === d} onPress={() => onChange({ ...value, distributor: d })} style={styles.chip} testID={`known-distributor-${d}`}>
                  {d}
                </Chip>
              ))}
            </View>
          ) : null}
          <Text variant="labelLarge">How the prices are written</Text>
          <View style={styles.chips}>
            {DECIMAL_CHOICES.map(([d, label]) => (
              <Chip key={d} selected={value.decimal === d} showSelectedOverlay onPress={() => onChange({ ...value, decimal: d })} style={styles.chip} testID={`import-decimal-${d}`}>
                {label}
              </Chip>
            ))}
          </View>
        </View>
      ) : null}
      <View style={styles.fileRow}>
        <Button mode="outlined" icon="file-document-outline" onPress={onPick} disabled={busy} contentStyle={styles.touch} testID="import-pick">
          {value.picked ? 'Choose another file' : 'Choose CSV file'}
        </Button>
        <Text variant="bodyMedium" style={styles.fileName} testID="import-file-name">
          {value.picked ? `${value.picked.name}${value.picked.sizeBytes != null ? ` (${formatSize(value.picked.sizeBytes)})` : ''}` : 'No file chosen'}
        </Text>
      </View>
      <Button mode="contained" icon="file-upload-outline" onPress={onSubmit} disabled={!ready || busy} loading={busy} contentStyle={styles.touch} testID="import-upload">
        Upload and check
      </Button>
    </View>
  );
}

function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

const styles = StyleSheet.create({
  gap: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  chip: { minHeight: TOUCH_TARGET - 8, justifyContent: 'center' },
  fileRow: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.md },
  fileName: { flex: 1, minWidth: 140 },
  touch: { minHeight: TOUCH_TARGET },
});
