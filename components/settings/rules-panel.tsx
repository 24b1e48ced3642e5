import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useRuleSettings, useSaveRuleSettings } from '@/hooks/use-rule-settings';
import { FormField } from '@/components/ui/form-field';
import { bodyOf, defaultHint, draftOf, rebateTiersText, SETTING_FIELDS } from './rules-draft';
import { SettingsPanelFrame } from './settings-panel-frame';
import { TransitionRuleCard } from './transition-rule-card';
import { useSettingsForm } from './use-settings-form';
import { CommissioningSettings } from './commissioning-settings';

/** Admin → Rules: the shop's thresholds and the refrigerant transition rules checks run with. */
export function RulesPanel() {
  const query = useRuleSettings();
  const save = useSaveRuleSettings();
  const form = useSettingsForm({ data: query.data, draftOf, bodyOf, save });
  const { draft, edit: setDraft, errors } = form;
  const resetDefaults = () => query.data && draft && setDraft({ ...draftOf({ ...query.data, settings: query.data.defaults }), rules: draft.rules });

  return (
    <SettingsPanelFrame
      title="Rules"
      subtitle="Thresholds your shop works to, and the refrigerant rules in force. Every check uses these."
      saveTestID="save-rules"
      loadingLabel="Loading the rule settings"
      savedText="Saved. New checks use these settings."
      query={query}
      save={save}
      form={form}
    >
      {draft ? (
        <>
          <View style={styles.grid}>
            {SETTING_FIELDS.map((f) => (
              <FormField
                key={f.key}
                style={styles.cell}
                label={f.label}
                value={draft.settings[f.key]}
                keyboardType="decimal-pad"
                onChangeText={(v) => setDraft({ ...draft, settings: { ...draft.settings, [f.key]: v } })}
                error={errors[`settings.${f.key}`]}
                hint={query.data ? defaultHint(query.data.defaults[f.key]) : undefined}
                testID={`setting-${f.key}`}
              />
            ))}
          </View>
          <CommissioningSettings
            values={draft.settings}
            defaults={query.data?.defaults}
            errors={errors}
            onChange={(key, v) => setDraft({ ...draft, settings: { ...draft.settings, [key]: v } })}
          />
          <Button mode="text" icon="restore" onPress={resetDefaults} contentStyle={styles.button}>
            Put the default thresholds back
          </Button>
          <Text variant="titleMedium" role="heading" aria-level={2}>
            Rebate tiers
          </Text>
          <Text variant="bodySmall" testID="rules-rebate-tiers">
            {rebateTiersText(query.data?.settings.rebateTiers?.length ?? 0)}
          </Text>
          <Button mode="outlined" icon="cash-multiple" onPress={() => router.push('/admin/pricing')} contentStyle={styles.button} style={styles.start}>
            Edit the rebate tiers on Pricing
          </Button>
          <Text variant="titleMedium" role="heading" aria-level={2}>
            Refrigerant transition rules
          </Text>
          <Text variant="bodySmall">
            Kept as data so the office can follow changes in the rules. Check the regulation itself before changing a date; local codes and the
            authority having jurisdiction come first.
          </Text>
          {draft.rules.map((rule, i) => (
            <TransitionRuleCard
              key={rule.id}
              rule={rule}
              index={i}
              errors={errors}
              onChange={(patch) => setDraft({ ...draft, rules: draft.rules.map((r, j) => (j === i ? { ...r, ...patch } : r)) })}
            />
          ))}
        </>
      ) : null}
    </SettingsPanelFrame>
  );
}

const styles = StyleSheet.create({
  button: { minHeight: TOUCH_TARGET },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, minWidth: 240 },
  start: { alignSelf: 'flex-start' },
});
