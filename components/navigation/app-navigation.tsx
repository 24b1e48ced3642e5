import { usePathname, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { navItemsFor } from '@/constants/navigation';
import { spacing } from '@/constants/theme';
import { useCurrentUser } from '@/hooks/use-session';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { ROLE_LABELS } from '@/components/account/role-labels';
import { NavButton } from './nav-button';

function useNav() {
  const user = useCurrentUser();
  const pathname = usePathname();
  const router = useRouter();
  const items = navItemsFor(user.role);
  const segment = pathname.split('/')[1] ?? '';
  return { items, segment, go: (href: string) => router.navigate(href as never), user };
}

/** Bottom tab bar for phones. */
export function BottomTabs() {
  const theme = useTandemTheme();
  const insets = useSafeAreaInsets();
  const { items, segment, go } = useNav();
  return (
    <View
      // Plain links in a navigation landmark: a tablist would need tabs and tab panels (axe aria-required-children).
      role="navigation"
      aria-label="Sections"
      testID="bottom-tabs"
      style={[styles.tabs, { backgroundColor: theme.colors.surface, borderTopColor: theme.colors.outlineVariant, paddingBottom: insets.bottom }]}
    >
      {items.map((item) => (
        <NavButton key={item.href} item={item} layout="tab" active={segment === item.segment} onPress={() => go(item.href)} />
      ))}
    </View>
  );
}

/** Side rail for wide screens, with the product name and who is signed in. */
export function SideRail() {
  const theme = useTandemTheme();
  const { items, segment, go, user } = useNav();
  return (
    <View testID="side-rail" role="navigation" aria-label="Sections" style={[styles.rail, { backgroundColor: theme.colors.surface, borderRightColor: theme.colors.outlineVariant }]}>
      <Text variant="headlineSmall" style={[styles.brand, { color: theme.colors.primary }]}>
        Tandem
      </Text>
      <View style={styles.railItems}>
        {items.map((item) => (
          <NavButton key={item.href} item={item} layout="rail" active={segment === item.segment} onPress={() => go(item.href)} />
        ))}
      </View>
      <View style={styles.railFooter}>
        <Text variant="labelMedium">{user.name}</Text>
        <Text variant="bodySmall" style={{ color: theme.colors.onSurfaceVariant }}>
          {ROLE_LABELS[user.role]}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  tabs: { flexDirection: 'row', borderTopWidth: StyleSheet.hairlineWidth, paddingTop: 4 },
  rail: { width: 232, borderRightWidth: StyleSheet.hairlineWidth, paddingHorizontal: spacing.md, paddingVertical: spacing.lg },
  brand: { paddingHorizontal: spacing.md, marginBottom: spacing.lg },
  railItems: { gap: spacing.xs },
  railFooter: { marginTop: 'auto', paddingHorizontal: spacing.md },
});
