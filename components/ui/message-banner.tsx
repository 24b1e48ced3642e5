import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';

type Tone = 'error' | 'success' | 'info';

const ICONS: Record<Tone, string> = { error: 'alert-octagon-outline', success: 'check-circle-outline', info: 'information-outline' };

/** An inline message with an icon and words (never colour alone). */
export function MessageBanner({ tone, children, testID }: { tone: Tone; children: string; testID?: string }) {
  const theme = useTandemTheme();
  const palette = {
    error: { bg: theme.status.blockerContainer, fg: theme.colors.onErrorContainer },
    success: { bg: theme.status.okContainer, fg: theme.colors.onSurface },
    info: { bg: theme.status.infoContainer, fg: theme.colors.onSurface },
  }[tone];
  return (
    <View accessibilityRole="alert" testID={testID} style={[styles.banner, { backgroundColor: palette.bg }]}>
      <DecorativeIcon source={ICONS[tone]} size={22} color={palette.fg} />
      <Text variant="bodyMedium" style={[styles.text, { color: palette.fg }]}>
        {children}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { flexDirection: 'row', gap: spacing.sm, padding: spacing.md, borderRadius: 10, alignItems: 'flex-start' },
  text: { flex: 1 },
});
