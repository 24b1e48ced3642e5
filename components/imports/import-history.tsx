import { useState } from 'react';
import { View } from 'react-native';
import { ActivityIndicator, DataTable, Text } from 'react-native-paper';
import { errorText } from '@/hooks/error-text';
import { useImports, type ImportView } from '@/hooks/use-imports';
import { useIsWide } from '@/hooks/use-layout';
import { MessageBanner } from '@/components/ui/message-banner';
import { HistoryEntry } from './history-entry';
import { RevertDialog } from './revert-dialog';

/** Past imports, newest first (the server's order), with Revert behind a confirmation. */
export function ImportHistory() {
  const imports = useImports();
  const wide = useIsWide();
  const [target, setTarget] = useState<ImportView | null>(null);
  if (imports.isPending) return <ActivityIndicator />;
  if (imports.isError) return <MessageBanner tone="error">{errorText(imports.error)}</MessageBanner>;
  if (imports.data.length === 0) return <Text variant="bodyMedium">No imports yet.</Text>;
  const entries = imports.data.map((e) => <HistoryEntry key={e.id} entry={e} wide={wide} onRevert={setTarget} />);
  return (
    <View testID="import-history">
      {wide ? (
        <DataTable>
          <DataTable.Header>
            <DataTable.Title style={{ flex: 2 }}>File</DataTable.Title>
            <DataTable.Title style={{ flex: 1.4 }}>Who and when</DataTable.Title>
            <DataTable.Title style={{ flex: 1.4 }}>Status</DataTable.Title>
            <DataTable.Title style={{ flex: 2.4 }}>Counts</DataTable.Title>
            <DataTable.Title style={{ flex: 1 }}> </DataTable.Title>
          </DataTable.Header>
          {entries}
        </DataTable>
      ) : (
        entries
      )}
      <RevertDialog target={target} onDismiss={() => setTarget(null)} />
    </View>
  );
}
