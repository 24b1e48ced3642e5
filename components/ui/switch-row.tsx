import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { MIN_TARGET_PX, spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

interface Props {
  label: string;
  value: boolean;
  onChange(value: boolean): void;
  testID?: string;
}

/** A whole-row switch: the words toggle it too, the row is the target, and its state is announced (role switch, aria-checked). */
export function SwitchRow({ label, value, onChange, testID }: Props) {
  const theme = useTandemTheme();
  return (
    <Pressable
      role="switch"
      aria-checked={value}
      onPress={() => onChange(!value)}
      testID={testID}
      style={({ pressed }) => [styles.row, pressed && { opacity: 0.7 }]}
    >
      <Text variant="bodyLarge" style={styles.label}>
        {label}
      </Text>
      {/* Drawn, not a second control: the row is the one switch. The word shows the state beside the colour. */}
      <View aria-hidden style={styles.visual}>
        <Text variant="labelMedium">{value ? 'Yes' : 'No'}</Text>
        <View style={[styles.track, { backgroundColor: value ? theme.colors.primary : theme.colors.surfaceVariant, borderColor: value ? theme.colors.primary : theme.colors.outline }]}>
          <View style={[styles.thumb, { backgroundColor: value ? theme.colors.onPrimary : theme.colors.outline }, value && styles.thumbOn]} />
        </View>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', minHeight: MIN_TARGET_PX, gap: spacing.sm },
  label: { flex: 1 },
  visual: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  track: { width: 48, height: 28, borderRadius: 14, borderWidth: 2, justifyContent: 'center', paddingHorizontal: 2 },
  thumb: { width: 20, height: 20, borderRadius: 10 },
  thumbOn: { alignSelf: 'flex-end' },
});
