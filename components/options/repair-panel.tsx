import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { useState } from 'react';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useRepairOrReplace } from '@/hooks/use-options';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { REFRIGERANT_IDS } from '@/shared/schemas/fields';
import { ChoiceChips } from '@/components/check/choice-chips';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { repairInputOf, type RepairTexts } from './repair-draft';

const REFRIGERANT_OPTIONS = REFRIGERANT_IDS.map((r) => ({ value: r, label: r }));
const RECOMMENDATION_WORDS = { replace: 'Replace', repair: 'Repair', either: 'Either is reasonable' } as const;

/**
 * Repair or replace: the existing system's age and figures (which also feed the options' energy
 * comparison), the repair quote and the recharge; the answer in plain words with its arithmetic.
 */
export function RepairPanel({ jobId, texts, onChange }: { jobId: number; texts: RepairTexts; onChange(t: RepairTexts): void }) {
  const theme = useTandemTheme();
  const work = useRepairOrReplace(jobId);
  const [problems, setProblems] = useState<string[]>([]);
  const set = (patch: Partial<RepairTexts>) => onChange({ ...texts, ...patch });
  const run = () => {
    const built = repairInputOf(texts);
    if ('problems' in built) {
      setProblems(built.problems);
      return;
    }
    setProblems([]);
    work.mutate(built.input);
  };
  const r = work.data;
  return (
    <SectionCard title="Repair or replace" testID="repair-panel">
      <Text variant="bodyMedium">The existing system’s figures also set the energy comparison on every option. Leave SEER2 or HSPF2 empty to estimate them from the age.</Text>
      <View style={styles.row}>
        <FormField label="Age, years" value={texts.ageYears} onChangeText={(ageYears) => set({ ageYears })} keyboardType="decimal-pad" style={styles.field} testID="repair-age" />
        <FormField label="Existing SEER2" value={texts.existingSeer2} onChangeText={(existingSeer2) => set({ existingSeer2 })} keyboardType="decimal-pad" style={styles.field} testID="existing-seer2" />
        <FormField label="Existing HSPF2" value={texts.existingHspf2} onChangeText={(existingHspf2) => set({ existingHspf2 })} keyboardType="decimal-pad" style={styles.field} testID="existing-hspf2" />
      </View>
      <View style={styles.row}>
        <FormField label="Repair quote, $" value={texts.repairQuote} onChangeText={(repairQuote) => set({ repairQuote })} keyboardType="decimal-pad" style={styles.field} testID="repair-quote" />
        <FormField label="Refrigerant to recharge, lb" value={texts.refrigerantLbs} onChangeText={(refrigerantLbs) => set({ refrigerantLbs })} keyboardType="decimal-pad" style={styles.field} testID="repair-lbs" />
        <FormField label="Refrigerant price, $ per lb" value={texts.refrigerantPerLb} onChangeText={(refrigerantPerLb) => set({ refrigerantPerLb })} keyboardType="decimal-pad" style={styles.field} testID="repair-per-lb" />
      </View>
      <ChoiceChips label="Refrigerant in the existing system" options={REFRIGERANT_OPTIONS} value={texts.refrigerant} onChange={(refrigerant) => set({ refrigerant })} testID="repair-refrigerant" />
      <Button mode="contained" icon="calculator-variant-outline" onPress={run} loading={work.isPending} contentStyle={styles.button} style={styles.start} testID="repair-run">
        Work it out
      </Button>
      {problems.length ? <MessageBanner tone="error">{problems.join(' ')}</MessageBanner> : null}
      {work.isError ? <MessageBanner tone="error">{errorText(work.error)}</MessageBanner> : null}
      {r ? (
        <View style={styles.answer} accessibilityLiveRegion="polite" testID="repair-answer">
          <View style={[styles.verdict, { backgroundColor: theme.colors.secondaryContainer }]}>
            <DecorativeIcon source={r.recommendation === 'replace' ? 'swap-horizontal' : r.recommendation === 'repair' ? 'wrench-outline' : 'scale-balance'} size={22} color={theme.colors.onSecondaryContainer} />
            <Text variant="titleMedium" testID="repair-recommendation">
              {RECOMMENDATION_WORDS[r.recommendation]}
            </Text>
          </View>
          <Text variant="bodyLarge">{r.recommendationText}</Text>
          <Text variant="titleSmall" role="heading" aria-level={3}>
            The arithmetic
          </Text>
          {r.arithmetic.map((step, i) => (
            <Text key={i} variant="bodyMedium">{`${i + 1}. ${step}`}</Text>
          ))}
          <Text variant="bodySmall" testID="rule-of-thumb">{`Where the age × repair rule comes from: ${r.ruleOfThumb.basis}, a trade rule of thumb.`}</Text>
          {r.notes.map((n, i) => (
            <Text key={i} variant="bodySmall">
              {n}
            </Text>
          ))}
        </View>
      ) : null}
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  field: { flexGrow: 1, flexBasis: 150 },
  start: { alignSelf: 'flex-start' },
  button: { minHeight: TOUCH_TARGET },
  answer: { gap: spacing.sm },
  verdict: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, padding: spacing.sm, borderRadius: 8, alignSelf: 'flex-start' },
});
