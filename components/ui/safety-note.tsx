import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { MIN_TARGET_PX, spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from './decorative-icon';

export const GENERAL_SAFETY_TEXT =
  'Electrical, brazing, pressure-test and refrigerant work is for licensed and certified people only. Follow the equipment’s installation instructions; local codes and the authority having jurisdiction come before anything Tandem says.';

/** The one line a folded Safety block shows: the caution itself, not just a heading. */
export const SAFETY_SUMMARY = 'Licensed and certified people only; follow the instructions and local code.';

interface Props {
  points?: string[];
  testID?: string;
  /** Folded to one line until opened (the phone, where the problems come first). */
  collapsed?: boolean;
}

/** The block headed "Safety" that screens show where the work can hurt someone; it can fold to one line. */
export function SafetyNote({ points = [], testID = 'safety-note', collapsed = false }: Props) {
  const theme = useTandemTheme();
  const [open, setOpen] = useState(!collapsed);
  const fg = theme.colors.onSecondaryContainer;
  return (
    <View testID={testID} style={[styles.box, { borderColor: theme.colors.secondary, backgroundColor: theme.colors.secondaryContainer }]}>
      {/* A heading holding its toggle (the ARIA accordion pattern): the heading stays in the outline. */}
      <View role="heading" aria-level={2}>
        <Pressable
          onPress={() => setOpen(!open)}
          accessibilityRole="button"
          aria-expanded={open}
          style={styles.head}
          testID="safety-toggle"
        >
          <DecorativeIcon source="shield-alert-outline" size={22} color={fg} />
          <View style={styles.words}>
            <Text variant="titleMedium" style={{ color: fg }}>
              Safety
            </Text>
            {open ? null : (
              <Text variant="bodyMedium" style={{ color: fg }}>
                {SAFETY_SUMMARY}
              </Text>
            )}
          </View>
          <DecorativeIcon source={open ? 'chevron-up' : 'chevron-down'} size={24} color={fg} />
        </Pressable>
      </View>
      {open ? (
        <View style={styles.body}>
          {points.map((p) => (
            <Text key={p} variant="bodyMedium" style={{ color: fg }}>
              • {p}
            </Text>
          ))}
          <Text variant="bodySmall" style={{ color: fg }}>
            {GENERAL_SAFETY_TEXT}
          </Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: 12, paddingHorizontal: spacing.md, paddingVertical: spacing.xs },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, minHeight: MIN_TARGET_PX },
  words: { flex: 1 },
  body: { gap: spacing.sm, paddingBottom: spacing.sm },
});
