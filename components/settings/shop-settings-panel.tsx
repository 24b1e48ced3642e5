import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useSaveShopSettings, useShopSettings } from '@/hooks/use-shop-settings';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { ToggleGroup } from '@/components/ui/toggle-group';
import type { ShopSettings } from '@/shared/schemas/options';
import { RebateTierRow } from './rebate-tier-row';
import { SettingsPanelFrame } from './settings-panel-frame';
import {
  bodyOf,
  defaultHint,
  draftOf,
  emptyTier,
  ENERGY_FIELDS,
  LABOR_FIELD,
  MARGIN_FIELD,
  MARKUP_FIELD,
  MAX_REBATE_TIERS,
  REPAIR_FIELD,
  TAX_FIELD,
  type ShopField,
  type ShopTierDraft,
} from './shop-settings-draft';
import { useSettingsForm } from './use-settings-form';

const PRICING_OPTIONS = [
  { value: 'markup', label: 'Markup on cost', testID: 'pricing-markup' },
  { value: 'margin', label: 'Target margin', testID: 'pricing-margin' },
] as const;

/** Admin → Pricing: labor rate, markup or margin, tax, the repair-or-replace threshold, energy assumptions and rebate tiers. */
export function ShopSettingsPanel() {
  const query = useShopSettings();
  const save = useSaveShopSettings();
  const form = useSettingsForm({ data: query.data, draftOf, bodyOf, save });
  const { draft, edit, errors, saved, onSave, clearError } = form;
  const resetDefaults = () => query.data && draft && edit({ ...draftOf({ settings: query.data.defaults }), tiers: draft.tiers });

  const field = (f: ShopField, defaults: ShopSettings | undefined) =>
    draft ? (
      <FormField
        key={f.key}
        style={styles.cell}
        label={f.label}
        value={draft.values[f.key]}
        keyboardType="decimal-pad"
        inputMode="decimal"
        onChangeText={(v) => (edit({ ...draft, values: { ...draft.values, [f.key]: v } }), clearError(f.key))}
        error={errors[f.key]}
        hint={defaultHint(f, defaults)}
        testID={`shop-${f.key}`}
      />
    ) : null;
  const setTier = (i: number, patch: Partial<ShopTierDraft>) =>
    draft && edit({ ...draft, tiers: draft.tiers.map((t, j) => (j === i ? { ...t, ...patch } : t)) });

  const defaults = query.data?.defaults;
  return (
    <SettingsPanelFrame
      title="Pricing and estimates"
      subtitle="The figures every priced option starts from."
      saveTestID="save-shop-settings"
      loadingLabel="Loading the shop settings"
      savedText="Saved. New options use these figures; options already saved keep theirs."
      query={query}
      save={save}
      form={form}
    >
      <Text variant="bodyMedium" testID="shop-settings-note">
        When an estimator saves a new option, it copies the labor rate, the markup or margin and the tax rate in from here (unless the estimator types its own); options already saved keep
        the figures they were priced with. The energy figures, rebate tiers and the repair-or-replace threshold are read each time options are shown.
      </Text>
      {draft ? (
        <>
          <SectionCard title="Labor, markup and tax">
            <ToggleGroup
              label="Price options by"
              value={draft.pricing}
              onChange={(pricing) => edit({ ...draft, pricing })}
              options={PRICING_OPTIONS}
            />
            <Text variant="bodySmall">
              {draft.pricing === 'markup'
                ? 'Markup adds a percentage to the cost: 35% on $1,000 of cost is a $1,350 price.'
                : 'Target margin is the share of the price kept: 30% margin on $1,000 of cost is a $1,428.57 price (cost ÷ 0.70).'}
            </Text>
            <View style={styles.grid}>
              {field(LABOR_FIELD, defaults)}
              {field(draft.pricing === 'markup' ? MARKUP_FIELD : MARGIN_FIELD, defaults)}
              {field(TAX_FIELD, defaults)}
            </View>
          </SectionCard>
          <SectionCard title="Repair or replace">
            <Text variant="bodySmall">
              The trade&apos;s rule of thumb (common practice, not a standard): when the system&apos;s age in years times the repair quote in dollars is above
              this number, replacing is suggested. The job screen shows the arithmetic; the decision stays with the customer.
            </Text>
            <View style={styles.grid}>{field(REPAIR_FIELD, defaults)}</View>
          </SectionCard>
          <SectionCard title="Energy estimates">
            <Text variant="bodySmall">
              Annual energy and payback use these hours and this price unless an estimate gives its own. Use figures for your area: your utility bill
              gives the price per kWh.
            </Text>
            <View style={styles.grid}>{ENERGY_FIELDS.map((f) => field(f, defaults))}</View>
          </SectionCard>
          <SectionCard title="Rebate tiers" testID="rebate-tiers">
            <Text variant="bodySmall">
              Each option shows which of these tiers it meets, and every compatibility check flags a combination that falls short of them (the one list
              of tiers: Admin → Rules uses it too). Give each tier at least one minimum rating; take the figures from your program&apos;s own rules.
            </Text>
            {draft.tiers.length === 0 ? <Text variant="bodyMedium">No tiers: options and checks will not judge a rebate tier.</Text> : null}
            {draft.tiers.map((tier, i) => (
              <RebateTierRow
                key={i}
                tier={tier}
                index={i}
                errors={errors}
                onChange={(patch) => setTier(i, patch)}
                onRemove={() => edit({ ...draft, tiers: draft.tiers.filter((_, j) => j !== i) })}
              />
            ))}
            {errors.rebateTiers ? <MessageBanner tone="error">{errors.rebateTiers}</MessageBanner> : null}
            <Button
              mode="outlined"
              icon="plus"
              onPress={() => edit({ ...draft, tiers: [...draft.tiers, emptyTier()] })}
              disabled={draft.tiers.length >= MAX_REBATE_TIERS}
              contentStyle={styles.button}
              testID="tier-add"
            >
              Add a rebate tier
            </Button>
          </SectionCard>
          <View style={styles.footer}>
            <Button mode="text" icon="restore" onPress={resetDefaults} contentStyle={styles.button} testID="shop-reset-defaults">
              Put the default figures back (tiers stay)
            </Button>
            {/* A second Save at the foot of the long form, so a phone need not scroll back up. */}
            <Button mode="contained" icon="content-save-outline" onPress={onSave} loading={save.isPending} disabled={save.isPending} contentStyle={styles.button} testID="save-shop-settings-bottom">
              Save
            </Button>
          </View>
          {saved ? <MessageBanner tone="success">Saved.</MessageBanner> : null}
          {Object.keys(errors).length ? <MessageBanner tone="error">Some entries need fixing (marked above).</MessageBanner> : null}
        </>
      ) : null}
    </SettingsPanelFrame>
  );
}

const styles = StyleSheet.create({
  button: { minHeight: TOUCH_TARGET },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 220, minWidth: 200 },
  footer: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: spacing.md },
});
