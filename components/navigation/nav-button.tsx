import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { MIN_TARGET_PX } from '@/constants/theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import type { NavItem } from '@/constants/navigation';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

interface Props {
  item: NavItem;
  active: boolean;
  onPress(): void;
  /** Rail buttons lay the label beside the icon; tab buttons below it. */
  layout: 'rail' | 'tab';
}

/** One navigation target: icon plus word, the active one marked by a filled pill and bold text. */
export function NavButton({ item, active, onPress, layout }: Props) {
  const theme = useTandemTheme();
  const color = active ? theme.colors.onPrimaryContainer : theme.colors.onSurfaceVariant;
  return (
    <Pressable
      accessibilityRole="link"
      aria-current={active ? 'page' : undefined}
      testID={`nav-${item.segment}`}
      onPress={onPress}
      style={[styles.base, layout === 'rail' ? styles.rail : styles.tab]}
    >
      <View style={[styles.pill, layout === 'rail' && styles.railPill, active && { backgroundColor: theme.colors.primaryContainer }]}>
        <DecorativeIcon source={item.icon} size={24} color={color} />
        {layout === 'rail' ? (
          <Text variant="labelLarge" style={{ color, fontFamily: active ? 'Inter-Bold' : 'Inter-Medium' }}>
            {item.label}
          </Text>
        ) : null}
      </View>
      {layout === 'tab' ? (
        <Text variant="labelSmall" style={{ color, fontFamily: active ? 'Inter-Bold' : 'Inter-Medium' }}>
          {item.label}
        </Text>
      ) : null}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: { minHeight: MIN_TARGET_PX, minWidth: MIN_TARGET_PX, justifyContent: 'center' },
  tab: { flex: 1, alignItems: 'center', paddingVertical: 6, gap: 2 },
  rail: { alignSelf: 'stretch' },
  pill: { paddingHorizontal: 16, paddingVertical: 4, borderRadius: 16, alignItems: 'center' },
  railPill: { flexDirection: 'row', gap: 12, paddingVertical: 12, borderRadius: 12 },
});
