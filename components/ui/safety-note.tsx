import { StyleSheet, View } from 'react-native';
import { Icon, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

export const GENERAL_SAFETY_TEXT =
  'Electrical, brazing, pressure-test and refrigerant work is for licensed and certified people only. Follow the equipment’s installation instructions; local codes and the authority having jurisdiction come before anything Tandem says.';

/** The block headed "Safety" that screens show where the work can hurt someone. */
export function SafetyNote({ points = [], testID = 'safety-note' }: { points?: string[]; testID?: string }) {
  const theme = useTandemTheme();
  return (
    <View testID={testID} style={[styles.box, { borderColor: theme.colors.secondary, backgroundColor: theme.colors.secondaryContainer }]}>
      <View style={styles.head}>
        <Icon source="shield-alert-outline" size={22} color={theme.colors.onSecondaryContainer} />
        <Text variant="titleMedium" accessibilityRole="header" style={{ color: theme.colors.onSecondaryContainer }}>
          Safety
        </Text>
      </View>
      {points.map((p) => (
        <Text key={p} variant="bodyMedium" style={{ color: theme.colors.onSecondaryContainer }}>
          • {p}
        </Text>
      ))}
      <Text variant="bodySmall" style={{ color: theme.colors.onSecondaryContainer }}>
        {GENERAL_SAFETY_TEXT}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: 12, padding: spacing.md, gap: spacing.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
});
