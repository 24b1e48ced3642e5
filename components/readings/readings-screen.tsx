import { useMemo } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { CONTENT_MAX_WIDTH, spacing, TOUCH_TARGET } from '@/constants/theme';
import { useIsWide } from '@/hooks/use-layout';
import { useRuleSettings } from '@/hooks/use-rule-settings';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { getRefrigerant } from '@/shared/refrigerants';
import { DEFAULT_RULE_SETTINGS } from '@/shared/rules/settings';
import { SafetyNote } from '@/components/ui/safety-note';
import { SectionCard } from '@/components/ui/section-card';
import type { ChartReading } from './chart-geometry';
import { EvacuationSection } from './evacuation-section';
import { PtLookupCard } from './pt-lookup-card';
import { liveReadings, type ReadingsDraft } from './readings-draft';
import { ReadingsForm } from './readings-form';
import { ReadingsResult } from './readings-result';
import { ReadingsStrip } from './readings-strip';
import { readingsSafetyPoints } from './readings-safety';
import { resetReadings, updateReadings, useReadingsState } from './readings-store';
import { SaturationChart } from './saturation-chart';
import { readNumber } from './number-text';

/**
 * Start-up readings: superheat, subcooling, targets and the verdict recomputed on the device on every
 * keystroke (the shared code, so it works with no signal), beside a P–T lookup and the saturation chart.
 */
export function ReadingsScreen() {
  const theme = useTandemTheme();
  const wide = useIsWide();
  const { readings: draft, evacuation } = useReadingsState();
  // The shop's margins; the shared defaults until they arrive (or when offline with nothing cached).
  const settings = useRuleSettings().data?.settings ?? DEFAULT_RULE_SETTINGS;
  const live = useMemo(() => liveReadings(draft, settings), [draft, settings]);
  const refrigerant = getRefrigerant(draft.refrigerant);
  const altitudeFt = readNumber(draft.values.altitudeFt).value ?? 0;
  const chartReadings = useMemo(() => readingsForChart(draft, live), [draft, live]);
  const setDraft = (next: ReadingsDraft) => updateReadings((s) => ({ ...s, readings: next }));

  const heading = (
    <View style={styles.header}>
      <View style={styles.titles}>
        <Text variant="headlineMedium" accessibilityRole="header">
          Readings
        </Text>
        <Text variant="bodyMedium" style={{ color: theme.colors.onSurfaceVariant }}>
          Gauges and line thermometers in; superheat, subcooling and what to do out — computed on this device.
        </Text>
      </View>
      <Button mode="outlined" icon="restart" onPress={resetReadings} contentStyle={styles.button} testID="readings-reset">
        Clear
      </Button>
    </View>
  );
  const form = <ReadingsForm draft={draft} live={live} onChange={setDraft} />;
  const result = <ReadingsResult live={live} zeotropic={Boolean(refrigerant?.zeotropic)} />;
  const tools = refrigerant ? (
    <>
      <SectionCard title="Saturation curve" testID="chart-card">
        <SaturationChart refrigerant={refrigerant.id} altitudeFt={altitudeFt} readings={chartReadings} />
      </SectionCard>
      <PtLookupCard refrigerant={refrigerant.id} altitudeFt={altitudeFt} zeotropic={refrigerant.zeotropic} />
    </>
  ) : null;
  const evac = (
    <EvacuationSection
      draft={evacuation}
      settings={settings}
      altitudeFt={altitudeFt}
      onChange={(next) => updateReadings((s) => ({ ...s, evacuation: next }))}
    />
  );
  const safety = <SafetyNote points={readingsSafetyPoints(draft.refrigerant)} />;

  return (
    <View style={[styles.fill, { backgroundColor: theme.colors.background }]}>
      <View style={styles.inner}>
        {wide ? (
          <>
            <View style={styles.pad}>{heading}</View>
            <View style={styles.columns}>
              <ScrollView style={styles.column} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled">
                {form}
                {evac}
              </ScrollView>
              <ScrollView style={styles.column} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled">
                {result}
                {tools}
                {safety}
              </ScrollView>
            </View>
          </>
        ) : (
          <>
            <ReadingsStrip live={live} />
            <ScrollView style={styles.column} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled">
              {heading}
              {form}
              {result}
              {tools}
              {evac}
              {safety}
            </ScrollView>
          </>
        )}
      </View>
    </View>
  );
}

function readingsForChart(draft: ReadingsDraft, live: ReturnType<typeof liveReadings>): ChartReading[] {
  const marks: ChartReading[] = [];
  const num = (k: keyof ReadingsDraft['values']) => readNumber(draft.values[k]).value;
  const suctionPsig = num('suctionPsig');
  const liquidPsig = num('liquidPsig');
  if (suctionPsig !== undefined && live.suctionSatF !== undefined)
    marks.push({ kind: 'suction', psig: suctionPsig, satF: live.suctionSatF, lineF: num('suctionLineF') });
  if (liquidPsig !== undefined && live.liquidSatF !== undefined)
    marks.push({ kind: 'liquid', psig: liquidPsig, satF: live.liquidSatF, lineF: num('liquidLineF') });
  return marks;
}

const styles = StyleSheet.create({
  fill: { flex: 1, minHeight: 0 },
  inner: { flex: 1, minHeight: 0, width: '100%', maxWidth: CONTENT_MAX_WIDTH, alignSelf: 'center' },
  pad: { paddingHorizontal: spacing.lg, paddingTop: spacing.lg },
  header: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.md },
  titles: { flex: 1, minWidth: 200, gap: 2 },
  button: { minHeight: TOUCH_TARGET },
  columns: { flex: 1, minHeight: 0, flexDirection: 'row' },
  column: { flex: 1, minHeight: 0 },
  columnContent: { padding: spacing.lg, gap: spacing.lg },
});
