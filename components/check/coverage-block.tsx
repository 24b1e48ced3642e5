import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import type { Coverage } from '@/shared/rules/types';
import { spacing } from '@/constants/theme';
import { familyWords } from './rule-words';

/** What could not be checked for want of facts, so a short form never reads as a clean pass. */
export function CoverageBlock({ coverage }: { coverage: Coverage }) {
  if (!coverage.notChecked.length) return null;
  return (
    <View style={styles.box} testID="coverage">
      <Text variant="titleMedium" role="heading" aria-level={2}>
        Not checked ({coverage.notChecked.length})
      </Text>
      <Text variant="bodyMedium">Give these facts to check more:</Text>
      {coverage.notChecked.map((n) => (
        <Text key={`${n.family}-${n.missing}`} variant="bodyMedium">
          • {familyWords(n.family)}: {n.missing} not given
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.xs } });
