import { StyleSheet, View } from 'react-native';
import { Card, Text } from 'react-native-paper';
import type { TransitionRule } from '@/shared/rules/types';
import { spacing } from '@/constants/theme';
import { FormField } from '@/components/ui/form-field';
import { citationWords } from '@/components/check/rule-words';

interface Props {
  rule: TransitionRule;
  index: number;
  errors: Record<string, string>;
  onChange(patch: Partial<TransitionRule>): void;
}

const SCOPE_WORDS = { 'new-system': 'new systems', 'component-replacement': 'component replacement', any: 'any work' } as const;

/** One refrigerant transition rule: what it covers, with its dates and note editable by the office. */
export function TransitionRuleCard({ rule, index, errors, onChange }: Props) {
  const err = (k: string) => errors[`transitionRules.${index}.${k}`];
  return (
    <Card mode="outlined" testID={`transition-rule-${rule.id}`}>
      <Card.Content style={styles.content}>
        <Text variant="titleMedium" role="heading" aria-level={3}>
          {rule.severity === 'blocker' ? 'Not allowed' : 'Caution'}: {rule.refrigerants.join(', ')} in {SCOPE_WORDS[rule.scope]}
        </Text>
        {/* The rule's id stays in the data and the test ids; the office reads the regulation it follows. */}
        <Text variant="bodySmall">{citationWords(rule.citation)}</Text>
        <View style={styles.dates}>
          <FormField style={styles.date} label="Installs from (YYYY-MM-DD)" value={rule.installFrom} onChangeText={(installFrom) => onChange({ installFrom })} error={err('installFrom')} testID={`rule-${rule.id}-installFrom`} />
          <FormField
            style={styles.date}
            label="Made before (exempt, YYYY-MM-DD)"
            value={rule.manufacturedBefore ?? ''}
            onChangeText={(v) => onChange({ manufacturedBefore: v.trim() === '' ? undefined : v })}
            error={err('manufacturedBefore')}
            hint="Leave empty when no sell-through applies"
          />
        </View>
        <FormField label="Note" value={rule.note} onChangeText={(note) => onChange({ note })} multiline error={err('note')} testID={`rule-${rule.id}-note`} />
      </Card.Content>
    </Card>
  );
}

const styles = StyleSheet.create({
  content: { gap: spacing.sm },
  dates: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  date: { flexGrow: 1, minWidth: 220 },
});
