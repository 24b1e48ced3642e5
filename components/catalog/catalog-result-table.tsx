import { StyleSheet } from 'react-native';
import { DataTable, Text } from 'react-native-paper';
import type { CatalogKind } from '@/shared/schemas/equipment';
import { TOUCH_TARGET } from '@/constants/theme';
import type { ItemSummary } from './item-summary';

interface Row {
  id: number;
  summary: ItemSummary;
}

/** The denser list for a wide screen: one row per item, the whole row opens it. */
export function CatalogResultTable({ kind, rows, onOpen }: { kind: CatalogKind; rows: Row[]; onOpen(id: number): void }) {
  const combos = kind === 'rated-combinations';
  return (
    <DataTable testID="catalog-results">
      <DataTable.Header>
        <DataTable.Title style={styles.model}>{combos ? 'Outdoor + indoor' : 'Model'}</DataTable.Title>
        <DataTable.Title style={styles.col}>{combos ? 'Air handler' : 'Brand'}</DataTable.Title>
        {combos ? null : <DataTable.Title style={styles.col}>Refrigerant</DataTable.Title>}
        <DataTable.Title style={styles.col}>{combos ? 'Capacity' : 'Size'}</DataTable.Title>
        <DataTable.Title style={styles.facts}>{combos ? 'Ratings' : 'Key facts'}</DataTable.Title>
      </DataTable.Header>
      {rows.map(({ id, summary }) => (
        <DataTable.Row key={id} onPress={() => onOpen(id)} style={styles.row} testID={`catalog-item-${summary.title}`}>
          <DataTable.Cell style={styles.model}>
            <Text variant="titleSmall">{summary.title}</Text>
          </DataTable.Cell>
          <DataTable.Cell style={styles.col}>{summary.brand ?? '—'}</DataTable.Cell>
          {combos ? null : <DataTable.Cell style={styles.col}>{summary.refrigerants ?? '—'}</DataTable.Cell>}
          <DataTable.Cell style={styles.col}>{summary.size ?? '—'}</DataTable.Cell>
          <DataTable.Cell style={styles.facts}>{summary.keyFacts ?? '—'}</DataTable.Cell>
        </DataTable.Row>
      ))}
    </DataTable>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: TOUCH_TARGET },
  model: { flex: 2 },
  col: { flex: 1.2 },
  facts: { flex: 2.2 },
});
