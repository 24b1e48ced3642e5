import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { IMPORT_KINDS, type ImportKind } from '@/shared/schemas/equipment';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { fetchTemplate } from '@/hooks/use-imports';
import { MessageBanner } from '@/components/ui/message-banner';
import { IMPORT_KIND_LABELS } from './import-labels';
import { saveFile } from './save-file';

/** A template per kind: the header row and two example rows to start a file from. */
export function TemplateLinks() {
  const [busy, setBusy] = useState<ImportKind | null>(null);
  const [error, setError] = useState<string | null>(null);
  const download = async (kind: ImportKind) => {
    setBusy(kind);
    setError(null);
    try {
      await saveFile(await fetchTemplate(kind), `${kind}-template.csv`);
    } catch (err) {
      setError(err instanceof Error && !('kind' in err) ? err.message : errorText(err));
    } finally {
      setBusy(null);
    }
  };
  return (
    <View style={styles.gap} testID="import-templates">
      <Text variant="bodyMedium">Start from a template: a header row with our column names and two example rows.</Text>
      {error ? <MessageBanner tone="error">{error}</MessageBanner> : null}
      <View style={styles.row}>
        {IMPORT_KINDS.map((k) => (
          <Button key={k} mode="text" icon="download-outline" loading={busy === k} onPress={() => download(k)} contentStyle={styles.touch} testID={`template-${k}`}>
            {IMPORT_KIND_LABELS[k]}
          </Button>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  touch: { minHeight: TOUCH_TARGET },
});
