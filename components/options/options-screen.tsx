import { router } from 'expo-router';
import { useMemo, useState } from 'react';
import { ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { ActivityIndicator, Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useIsWide } from '@/hooks/use-layout';
import { useJob } from '@/hooks/use-jobs';
import { useChooseOption, useDeleteOption, useJobOptions, useMakeRecord } from '@/hooks/use-options';
import { MAX_OPTIONS_PER_JOB, type OptionView } from '@/shared/schemas/options';
import { useDebouncedValue } from '@/components/catalog/use-debounced-value';
import { AppDialog } from '@/components/ui/app-dialog';
import { MessageBanner } from '@/components/ui/message-banner';
import { SafetyNote } from '@/components/ui/safety-note';
import { Screen } from '@/components/ui/screen';
import { SectionCard } from '@/components/ui/section-card';
import { CostBars } from './cost-bars';
import { OptionCard } from './option-card';
import { draftFromOption, emptyDraft, type OptionDraft } from './option-draft';
import { OptionEditor } from './option-editor';
import { annualCostCents, existingAnnualCostCents, optionFigureRows } from './option-figures';
import { differingKeys } from './option-words';
import { ProposalCard } from './proposal-card';
import { emptyRepairTexts, energyQueryOf, type RepairTexts } from './repair-draft';
import { RepairPanel } from './repair-panel';

const TYPING_DEBOUNCE_MS = 400;
/** On a phone each card takes the screen's width less this, so the next card peeks in (it can be swiped to). */
const PEEK_PX = 40;

/** A job's options side by side (paged on a phone), the yearly cost chart, repair or replace, and the proposal. */
export function OptionsScreen({ jobId }: { jobId: number }) {
  const wide = useIsWide();
  const { width } = useWindowDimensions();
  const job = useJob(jobId);
  const [repair, setRepair] = useState<RepairTexts>(emptyRepairTexts());
  const energy = useDebouncedValue(useMemo(() => energyQueryOf(repair), [repair]), TYPING_DEBOUNCE_MS);
  const options = useJobOptions(jobId, energy);
  const choose = useChooseOption();
  const makeRecord = useMakeRecord();
  const remove = useDeleteOption();
  const [editing, setEditing] = useState<OptionDraft | null>(null);
  const [removing, setRemoving] = useState<OptionView | null>(null);

  const items = options.data?.items ?? [];
  const rows = useMemo(() => optionFigureRows(items), [items]);
  const differing = useMemo(() => differingKeys(rows), [rows]);
  const bars = useMemo(() => {
    const existing = existingAnnualCostCents(items);
    return [{ key: 'existing', label: 'Existing system', valueCents: existing }, ...items.map((o) => ({ key: String(o.id), label: o.name, valueCents: annualCostCents(o) }))];
  }, [items]);
  const full = items.length >= MAX_OPTIONS_PER_JOB;
  const cardWidth = Math.max(260, width - 2 * spacing.lg - PEEK_PX);
  const busy = choose.isPending || makeRecord.isPending || remove.isPending;

  const toRecord = (o: OptionView) =>
    makeRecord.mutate(o.id, {
      onSuccess: (record) => router.push(`/jobs/systems/${record.id}`),
    });
  const cards = items.map((o, i) => (
    <View key={o.id} style={wide ? styles.wideCell : { width: cardWidth }}>
      <OptionCard
        option={o}
        index={i}
        count={items.length}
        rows={rows}
        differing={differing}
        busy={busy}
        onEdit={() => setEditing(draftFromOption(o))}
        onChoose={() => choose.mutate(o.id)}
        onMakeRecord={() => toRecord(o)}
        onRemove={() => setRemoving(o)}
      />
    </View>
  ));
  const actionError = choose.error ?? makeRecord.error ?? remove.error;

  return (
    <Screen
      title={job.data ? `Options for ${job.data.customerName}` : 'Options'}
      subtitle={job.data ? `${job.data.siteAddress}, ${job.data.state}` : undefined}
      actions={
        <>
          <Button mode="outlined" icon="arrow-left" onPress={() => router.push(`/jobs/${jobId}`)} contentStyle={styles.button}>
            Back to the job
          </Button>
          {!editing ? (
            <Button mode="contained" icon="plus" onPress={() => setEditing(emptyDraft())} disabled={full || !options.data} contentStyle={styles.button} testID="add-option">
              Add an option
            </Button>
          ) : null}
        </>
      }
    >
      {job.isError ? <MessageBanner tone="error">{errorText(job.error)}</MessageBanner> : null}
      {full && !editing ? <Text variant="bodySmall">{`A job holds at most ${MAX_OPTIONS_PER_JOB} options: remove one to add another.`}</Text> : null}
      {editing ? (
        <OptionEditor
          key={editing.base?.id ?? 'new'}
          jobId={jobId}
          start={editing}
          onCancel={() => setEditing(null)}
          onDone={() => setEditing(null)}
        />
      ) : null}

      <SectionCard title="Compare" testID="options-compare">
        {options.isPending ? <ActivityIndicator accessibilityLabel="Loading the options" /> : null}
        {options.isError ? <MessageBanner tone="error">{errorText(options.error)}</MessageBanner> : null}
        {actionError ? <MessageBanner tone="error">{errorText(actionError)}</MessageBanner> : null}
        {options.data && items.length === 0 ? (
          <Text variant="bodyMedium">No options yet. Add one here, or from a coil on the Coils tab (“Add to option”).</Text>
        ) : null}
        {items.length > 1 ? <Text variant="bodySmall">Figures marked “differs” are not the same on every option.</Text> : null}
        {items.length > 0 && !wide ? <Text variant="bodySmall">{items.length > 1 ? 'Swipe sideways to see each option.' : ''}</Text> : null}
        {wide ? (
          <View style={styles.wideRow} testID="option-cards">
            {cards}
          </View>
        ) : (
          <ScrollView
            horizontal
            snapToInterval={cardWidth + spacing.md}
            decelerationRate="fast"
            snapToAlignment="start"
            showsHorizontalScrollIndicator
            contentContainerStyle={styles.pager}
            testID="option-cards"
          >
            {cards}
          </ScrollView>
        )}
      </SectionCard>

      {items.length > 0 ? (
        <SectionCard title="Energy cost a year" testID="options-chart">
          <CostBars entries={bars} />
          {items[0]?.energy.assumptions.map((a, i) => (
            <Text key={i} variant="bodySmall">
              {a}
            </Text>
          ))}
        </SectionCard>
      ) : null}

      <RepairPanel jobId={jobId} texts={repair} onChange={setRepair} />
      <ProposalCard jobId={jobId} contactEmail={job.data?.contactEmail ?? null} energy={energy} optionCount={items.length} />
      <SafetyNote
        points={[
          'Prices and figures here are estimates for the customer’s decision; the installed system is checked again on its record.',
          'Electrical work, brazing, pressure tests and refrigerant handling (A2L refrigerants are mildly flammable) are for licensed and certified people only.',
        ]}
      />

      <AppDialog
        visible={removing !== null}
        onDismiss={() => setRemoving(null)}
        title="Remove this option?"
        testID="option-remove-dialog"
        actions={
          <>
            <Button onPress={() => setRemoving(null)} contentStyle={styles.button}>
              Keep it
            </Button>
            <Button
              mode="contained"
              onPress={() => {
                if (removing) remove.mutate(removing.id, { onSettled: () => setRemoving(null) });
              }}
              loading={remove.isPending}
              contentStyle={styles.button}
              testID="option-remove-confirm"
            >
              Remove
            </Button>
          </>
        }
      >
        <Text variant="bodyMedium">{removing ? `“${removing.name}” and its prices go from this job and from the proposal.` : ''}</Text>
      </AppDialog>
    </Screen>
  );
}

const styles = StyleSheet.create({
  button: { minHeight: TOUCH_TARGET },
  wideRow: { flexDirection: 'row', gap: spacing.md, alignItems: 'stretch' },
  wideCell: { flex: 1, minWidth: 0 },
  pager: { gap: spacing.md, paddingBottom: spacing.sm },
});
