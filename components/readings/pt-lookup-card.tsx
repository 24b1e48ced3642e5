import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { SectionCard } from '@/components/ui/section-card';
import { formatNumber } from './number-text';
import { lookupByPressure, lookupByTemperature, type LookupAnswer } from './pt-lookup';
import { ReadingField } from './reading-field';

function Answer({ answer, unit, zeotropic, testID }: { answer: LookupAnswer; unit: string; zeotropic: boolean; testID: string }) {
  if (answer.bubble === undefined || answer.dew === undefined) return null;
  const text = zeotropic
    ? `Bubble ${formatNumber(answer.bubble)} ${unit} · Dew ${formatNumber(answer.dew)} ${unit}`
    : `Saturation ${formatNumber(answer.dew)} ${unit}`;
  return (
    <Text variant="titleMedium" testID={testID}>
      {text}
    </Text>
  );
}

/** A pocket pressure–temperature chart: type either side, see bubble and dew. */
export function PtLookupCard({ refrigerant, altitudeFt, zeotropic }: { refrigerant: string; altitudeFt: number; zeotropic: boolean }) {
  const [psig, setPsig] = useState('');
  const [tempF, setTempF] = useState('');
  const byPressure = lookupByPressure(psig, refrigerant, altitudeFt);
  const byTemp = lookupByTemperature(tempF, refrigerant, altitudeFt);
  return (
    <SectionCard title={`Pressure–temperature, ${refrigerant}`} testID="pt-lookup">
      <View style={styles.row}>
        <View style={styles.cell}>
          <ReadingField label="Pressure (psig)" value={psig} onChangeText={setPsig} error={byPressure.error} testID="pt-psig" />
          <Answer answer={byPressure} unit="°F" zeotropic={zeotropic} testID="pt-psig-answer" />
        </View>
        <View style={styles.cell}>
          <ReadingField label="Temperature (°F)" value={tempF} onChangeText={setTempF} error={byTemp.error} testID="pt-temp" />
          <Answer answer={byTemp} unit="psig" zeotropic={zeotropic} testID="pt-temp-answer" />
        </View>
      </View>
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 150, gap: spacing.xs },
});
