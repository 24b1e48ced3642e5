import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { MIN_TARGET_PX, spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from './decorative-icon';

interface Props {
  label: string;
  selected: boolean;
  /** A decorative icon before the words (the words name the choice). */
  icon?: string;
  /** 'link' for a chip that goes somewhere: announced as a link, the current one as the current page. */
  kind?: 'toggle' | 'link';
  onPress(): void;
  testID?: string;
  disabled?: boolean;
}

/** A choice a thumb can hit: a 48 px pill whose state is announced (aria-pressed) and drawn with a tick, not colour alone. */
export function ToggleChip({ label, selected, icon, kind = 'toggle', onPress, testID, disabled }: Props) {
  const theme = useTandemTheme();
  const fg = selected ? theme.colors.onPrimaryContainer : theme.colors.onSurface;
  return (
    <Pressable
      accessibilityRole={kind === 'link' ? 'link' : 'button'}
      aria-pressed={kind === 'toggle' ? selected : undefined}
      aria-current={kind === 'link' && selected ? 'page' : undefined}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [
        styles.chip,
        { borderColor: selected ? theme.colors.primary : theme.colors.outline, backgroundColor: selected ? theme.colors.primaryContainer : theme.colors.surface },
        pressed && { opacity: 0.7 },
        disabled && { opacity: 0.5 },
      ]}
    >
      <View style={styles.inner}>
        {selected ? <DecorativeIcon source="check" size={18} color={fg} /> : icon ? <DecorativeIcon source={icon} size={18} color={fg} /> : null}
        <Text variant="labelLarge" style={[styles.label, { color: fg }]}>
          {label}
        </Text>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: { minHeight: MIN_TARGET_PX, minWidth: MIN_TARGET_PX, borderWidth: 1, borderRadius: 10, paddingHorizontal: spacing.md, justifyContent: 'center' },
  inner: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, justifyContent: 'center' },
  // In an equal-width row a long word wraps inside its chip instead of being cut off.
  label: { flexShrink: 1, textAlign: 'center' },
});
