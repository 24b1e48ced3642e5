import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';

/** An address the app does not know (a mistyped or old link): plain words and one way back. */
export function NotFoundScreen() {
  const router = useRouter();
  const theme = useTandemTheme();
  return (
    <View style={[styles.fill, { backgroundColor: theme.colors.background }]} testID="not-found">
      <View style={styles.box}>
        <Text variant="headlineMedium" accessibilityRole="header">
          This page is not in Tandem
        </Text>
        <Text variant="bodyLarge" style={{ color: theme.colors.onSurfaceVariant }}>
          The link may be mistyped, or the page may have moved. Your check form is still where you left it.
        </Text>
        <Button mode="contained" icon="arrow-left" onPress={() => router.replace('/check')} contentStyle={styles.button} testID="not-found-home">
          Back to Check
        </Button>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: spacing.lg },
  box: { maxWidth: 480, width: '100%', gap: spacing.lg },
  button: { minHeight: TOUCH_TARGET },
});
