import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { REFRIGERANT_IDS } from '@/shared/schemas/fields';
import { ChoiceChips } from '@/components/check/choice-chips';
import { SectionCard } from '@/components/ui/section-card';
import type { LiveReadings, ReadingKey, ReadingsDraft } from './readings-draft';
import { ReadingField } from './reading-field';
import { UnitPicker } from './unit-picker';

const REFRIGERANT_OPTIONS = REFRIGERANT_IDS.map((id) => ({ value: id, label: id }));
const METERING_OPTIONS = [
  { value: 'piston', label: 'Fixed orifice (piston)' },
  { value: 'txv', label: 'TXV' },
  { value: 'eev', label: 'EEV' },
];
const MODE_OPTIONS = [
  { value: 'cooling', label: 'Cooling' },
  { value: 'heating', label: 'Heating' },
];
const INDOOR_OPTIONS = [
  { value: 'wet-bulb', label: 'Wet bulb' },
  { value: 'humidity', label: 'Dry bulb + humidity' },
];

interface Props {
  draft: ReadingsDraft;
  live: LiveReadings;
  onChange(next: ReadingsDraft): void;
}

/** The readings as the tech takes them at the unit: system, gauges, line thermometers, air. */
export function ReadingsForm({ draft, live, onChange }: Props) {
  const set = (patch: Partial<ReadingsDraft>) => onChange({ ...draft, ...patch });
  const field = (key: ReadingKey, label: string, hint?: string) => (
    <ReadingField
      label={label}
      value={draft.values[key] ?? ''}
      onChangeText={(v) => set({ values: { ...draft.values, [key]: v } })}
      error={live.errors[key]}
      hint={hint}
      testID={`reading-${key}`}
    />
  );
  const wbHint = live.indoorWbF !== undefined && draft.indoorBy === 'humidity' ? `Wet bulb ${live.indoorWbF.toFixed(1)} °F` : undefined;
  return (
    <View style={styles.stack}>
      <SectionCard title="System">
        <UnitPicker draft={draft} onChange={onChange} />
        <ChoiceChips
          label="Refrigerant"
          options={REFRIGERANT_OPTIONS}
          value={draft.refrigerant}
          onChange={(v) => v && set({ refrigerant: v, unitLabel: undefined })}
          error={live.errors.refrigerant}
          testID="refrigerant"
        />
        <ChoiceChips
          label="Metering device"
          options={METERING_OPTIONS}
          value={draft.meteringType}
          onChange={(v) => set({ meteringType: v as ReadingsDraft['meteringType'] })}
          hint="A fixed orifice is charged to superheat; a TXV or EEV to subcooling."
          testID="metering"
        />
        <ChoiceChips
          label="Mode"
          options={MODE_OPTIONS}
          value={draft.mode}
          onChange={(v) => v && set({ mode: v as ReadingsDraft['mode'] })}
          testID="mode"
        />
      </SectionCard>
      <SectionCard title="Suction (vapor) line">
        <View style={styles.row}>
          {field('suctionPsig', 'Suction pressure (psig)')}
          {field('suctionLineF', 'Suction line (°F)')}
        </View>
      </SectionCard>
      <SectionCard title="Liquid line">
        <View style={styles.row}>
          {field('liquidPsig', 'Liquid pressure (psig)')}
          {field('liquidLineF', 'Liquid line (°F)')}
        </View>
      </SectionCard>
      <SectionCard title="Air">
        <View style={styles.row}>{field('outdoorDbF', 'Outdoor dry bulb (°F)')}</View>
        <ChoiceChips
          label="Indoor air measured as"
          options={INDOOR_OPTIONS}
          value={draft.indoorBy}
          onChange={(v) => v && set({ indoorBy: v as ReadingsDraft['indoorBy'] })}
          testID="indoor-by"
        />
        <View style={styles.row}>
          {draft.indoorBy === 'wet-bulb' ? (
            field('indoorWbF', 'Indoor wet bulb (°F)', 'Return air, needed for a fixed orifice.')
          ) : (
            <>
              {field('indoorDbF', 'Indoor dry bulb (°F)', wbHint)}
              {field('indoorRhPct', 'Indoor humidity (% RH)')}
            </>
          )}
        </View>
      </SectionCard>
      <SectionCard title="More">
        <Text variant="bodySmall">
          Optional. The unit’s own target subcooling comes from its data plate or instructions; altitude corrects the gauges.
        </Text>
        <View style={styles.row}>
          {field('targetSubcoolingF', 'Target subcooling (°F)', 'Blank: the unit’s or the shop’s default.')}
          {field('altitudeFt', 'Altitude (ft)', 'Blank: sea level.')}
        </View>
      </SectionCard>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
