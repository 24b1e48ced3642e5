import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { errorText } from '@/hooks/error-text';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { optionQuery, useCreateOption, useSaveOption } from '@/hooks/use-options';
import { EXTRA_LINE_KINDS, type OptionInput, type OptionView } from '@/shared/schemas/options';
import { CatalogSearch } from '@/components/check/catalog-search';
import type { PickedPart } from '@/components/check/check-store';
import { ChoiceChips } from '@/components/check/choice-chips';
import type { PartSlot } from '@/components/check/part-slots';
import { ConflictDialog } from '@/components/ui/conflict-dialog';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { SwitchRow } from '@/components/ui/switch-row';
import { ToggleGroup } from '@/components/ui/toggle-group';
import { optionConflictIntro, optionConflictRows } from './option-conflict';
import { buildOptionInput, draftFromOption, emptyLine, EXTRA_KIND_WORDS, type DraftLine, type DraftPart, type OptionDraft } from './option-draft';

const KIND_OPTIONS = EXTRA_LINE_KINDS.map((k) => ({ value: k, label: EXTRA_KIND_WORDS[k] }));

/** A picked part with "Change", or the catalog search (the same one as the Check screen's). */
function PartField({ title, slot, part, onChange, keptLabel }: { title: string; slot: PartSlot; part?: DraftPart; onChange(p?: DraftPart): void; keptLabel?: string }) {
  const pick = (p: PickedPart) => onChange({ id: p.id, label: p.label, kept: slot === 'airHandler' });
  return (
    <View style={styles.part}>
      <Text variant="titleSmall">{title}</Text>
      {part ? (
        <>
          <View style={styles.picked}>
            <Text variant="bodyLarge" testID={`${slot}-picked`}>
              {part.label}
            </Text>
            <Button mode="outlined" onPress={() => onChange(undefined)} contentStyle={styles.button} accessibilityLabel={`Choose another ${title.toLowerCase()}`}>
              Change
            </Button>
          </View>
          {keptLabel ? <SwitchRow label={keptLabel} value={part.kept} onChange={(kept) => onChange({ ...part, kept })} testID={`${slot}-kept`} /> : null}
        </>
      ) : (
        <CatalogSearch slot={slot} onPick={pick} />
      )}
    </View>
  );
}

function LineFields({ line, index, onChange, onRemove }: { line: DraftLine; index: number; onChange(l: DraftLine): void; onRemove(): void }) {
  const theme = useTandemTheme();
  const set = (patch: Partial<DraftLine>) => onChange({ ...line, ...patch });
  return (
    <View style={[styles.lineBox, { borderColor: theme.colors.secondary }]} testID={`extra-${index}`}>
      <ChoiceChips label={`Line ${index + 1}: kind`} options={KIND_OPTIONS} value={line.kind} onChange={(v) => v && set({ kind: v as DraftLine['kind'] })} testID={`extra-${index}-kind`} />
      <FormField label="Description" value={line.description} onChangeText={(description) => set({ description })} testID={`extra-${index}-description`} />
      <View style={styles.fieldRow}>
        <FormField label="Model (priced from the price list)" value={line.model} onChangeText={(model) => set({ model })} autoCapitalize="characters" style={styles.grow} testID={`extra-${index}-model`} />
        <FormField label="Quantity" value={line.quantity} onChangeText={(quantity) => set({ quantity })} keyboardType="decimal-pad" style={styles.small} testID={`extra-${index}-quantity`} />
        <FormField
          label="Unit price, $"
          value={line.price}
          onChangeText={(price) => set({ price })}
          keyboardType="decimal-pad"
          style={styles.small}
          hint={line.price ? undefined : 'Empty: from the price list'}
          testID={`extra-${index}-price`}
        />
      </View>
      <Button mode="text" icon="delete-outline" onPress={onRemove} contentStyle={styles.button} style={styles.start} accessibilityLabel={`Remove line ${index + 1}`}>
        Remove line
      </Button>
    </View>
  );
}

interface Props {
  jobId: number;
  /** The option to edit, or a starting draft for a new one. */
  start: OptionDraft;
  onDone(saved: OptionView): void;
  onCancel(): void;
}

/** Create or edit an option: name, parts from the catalog, extras lines, labor, pricing and tax. */
export function OptionEditor({ jobId, start, onDone, onCancel }: Props) {
  const [draft, setDraft] = useState<OptionDraft>(start);
  const [problems, setProblems] = useState<string[]>([]);
  const [theirs, setTheirs] = useState<OptionView | null>(null);
  const create = useCreateOption(jobId);
  const save = useSaveOption();
  const client = useQueryClient();
  const set = (patch: Partial<OptionDraft>) => setDraft((d) => ({ ...d, ...patch }));
  const editing = draft.base;

  const submit = async (input: OptionInput, revision?: number) => {
    try {
      const saved = editing
        ? await save.mutateAsync({ id: editing.id, patch: { ...input, revision: revision ?? editing.revision, markupPct: input.markupPct ?? null, targetMarginPct: input.targetMarginPct ?? null } })
        : await create.mutateAsync(input);
      onDone(saved);
    } catch (err) {
      if (editing && err instanceof ApiError && err.kind === 'conflict') {
        // Someone saved since this edit began: fetch their version and let the estimator choose.
        const current = (err.details as { current?: OptionView } | undefined)?.current ?? (await client.fetchQuery({ ...optionQuery(editing.id), staleTime: 0 }).catch(() => null));
        if (current) setTheirs(current);
      }
    }
  };
  const onSave = () => {
    const built = buildOptionInput(draft);
    if ('problems' in built) {
      setProblems(built.problems);
      return;
    }
    setProblems([]);
    void submit(built.input);
  };
  const error = create.error ?? save.error;
  const showError = error && !(error instanceof ApiError && error.kind === 'conflict' && theirs);

  return (
    <SectionCard title={editing ? `Edit “${start.name}”` : 'New option'} testID="option-editor">
      <FormField label="Option name (your words)" value={draft.name} onChangeText={(name) => set({ name })} maxLength={60} testID="option-name" hint="For example “Heat pump, keep the air handler”." />
      <PartField title="New outdoor unit" slot="outdoor" part={draft.outdoor} onChange={(outdoor) => set({ outdoor })} />
      <PartField title="Indoor coil" slot="indoorCoil" part={draft.indoorCoil} onChange={(indoorCoil) => set({ indoorCoil })} keptLabel="The existing coil stays" />
      <PartField title="Air handler or furnace" slot="airHandler" part={draft.airHandler} onChange={(airHandler) => set({ airHandler })} keptLabel="It stays (not sold in this option)" />

      <Text variant="titleMedium" role="heading" aria-level={3}>
        Extras
      </Text>
      <Text variant="bodySmall">New catalog parts are priced from today’s best price list entry when saved. Give a model to price an extra the same way, or type its price.</Text>
      {draft.lines.map((line, i) => (
        <LineFields key={i} line={line} index={i} onChange={(l) => set({ lines: draft.lines.map((x, j) => (j === i ? l : x)) })} onRemove={() => set({ lines: draft.lines.filter((_, j) => j !== i) })} />
      ))}
      <Button mode="outlined" icon="plus" onPress={() => set({ lines: [...draft.lines, emptyLine()] })} contentStyle={styles.button} style={styles.start} testID="add-extra">
        Add a line
      </Button>

      <Text variant="titleMedium" role="heading" aria-level={3}>
        Labor, pricing and tax
      </Text>
      <View style={styles.fieldRow}>
        <FormField label="Labor hours" value={draft.laborHours} onChangeText={(laborHours) => set({ laborHours })} keyboardType="decimal-pad" style={styles.small} testID="option-labor-hours" />
        <FormField label="Rate, $ an hour" value={draft.laborRate} onChangeText={(laborRate) => set({ laborRate })} keyboardType="decimal-pad" style={styles.small} hint={draft.laborRate ? undefined : 'Empty: the shop’s rate'} testID="option-labor-rate" />
        <FormField label="Tax rate, %" value={draft.taxRate} onChangeText={(taxRate) => set({ taxRate })} keyboardType="decimal-pad" style={styles.small} hint={draft.taxRate ? undefined : 'Empty: the shop’s rate'} testID="option-tax" />
      </View>
      <ToggleGroup
        label="Pricing"
        value={draft.pricing}
        onChange={(pricing) => set({ pricing })}
        options={[
          { value: 'shop', label: 'Shop default', testID: 'pricing-shop' },
          { value: 'markup', label: 'Markup', testID: 'pricing-markup' },
          { value: 'margin', label: 'Target margin', testID: 'pricing-margin' },
        ]}
      />
      {draft.pricing !== 'shop' ? (
        <FormField label={draft.pricing === 'markup' ? 'Markup on cost, %' : 'Target margin of the price, %'} value={draft.pct} onChangeText={(pct) => set({ pct })} keyboardType="decimal-pad" testID="option-pct" />
      ) : null}

      {problems.length ? <MessageBanner tone="error" testID="option-problems">{problems.join(' ')}</MessageBanner> : null}
      {showError ? <MessageBanner tone="error">{errorText(error)}</MessageBanner> : null}
      <View style={styles.buttons}>
        <Button onPress={onCancel} contentStyle={styles.button} testID="option-cancel">
          Cancel
        </Button>
        <Button mode="contained" icon="content-save-outline" onPress={onSave} loading={create.isPending || save.isPending} contentStyle={styles.button} testID="option-save">
          Save option
        </Button>
      </View>
      <ConflictDialog
        visible={theirs !== null}
        intro={theirs ? optionConflictIntro(theirs) : null}
        rows={theirs ? optionConflictRows(draft, theirs) : []}
        noClashText="Your form holds the same values as theirs; either choice keeps them."
        testID="option-conflict"
        onKeepMine={() => {
          const rev = theirs?.revision;
          setTheirs(null);
          const built = buildOptionInput(draft);
          if ('input' in built) void submit(built.input, rev);
        }}
        onTakeTheirs={() => {
          const t = theirs;
          setTheirs(null);
          if (t) setDraft(draftFromOption(t));
        }}
      />
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  part: { gap: spacing.xs },
  picked: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
  lineBox: { gap: spacing.sm, paddingLeft: spacing.md, borderLeftWidth: 3 },
  fieldRow: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  grow: { flexGrow: 2, flexBasis: 200 },
  small: { flexGrow: 1, flexBasis: 120 },
  start: { alignSelf: 'flex-start' },
  buttons: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm, flexWrap: 'wrap' },
  button: { minHeight: TOUCH_TARGET },
});
