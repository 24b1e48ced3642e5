import { StyleSheet, View } from 'react-native';
import { Icon, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { useIsOnline } from '@/hooks/use-connection';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

/** A slim line across the top while the server is out of reach: what still works, in plain words. */
export function ConnectionBanner() {
  const online = useIsOnline();
  const theme = useTandemTheme();
  if (online) return null;
  return (
    <View style={[styles.bar, { backgroundColor: theme.status.cautionContainer }]} accessibilityLiveRegion="polite" testID="connection-banner">
      <View aria-hidden>
        <Icon source="cloud-off-outline" size={20} color={theme.colors.onSurface} />
      </View>
      <Text variant="bodyMedium" style={[styles.text, { color: theme.colors.onSurface }]}>
        No connection. Checks run on this phone; catalog search uses the parts saved here.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingHorizontal: spacing.lg, paddingVertical: spacing.sm },
  text: { flex: 1 },
});
