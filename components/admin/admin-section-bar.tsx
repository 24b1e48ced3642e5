import { usePathname, useRouter } from 'expo-router';
import { ScrollView, StyleSheet } from 'react-native';
import { ADMIN_SECTIONS } from '@/constants/navigation';
import { CONTENT_MAX_WIDTH, spacing } from '@/constants/theme';
import { ToggleChip } from '@/components/ui/toggle-chip';

/** The Admin sections as a row of selectable chips (scrolls sideways on a narrow phone). */
export function AdminSectionBar() {
  const pathname = usePathname();
  const router = useRouter();
  const current = pathname.split('/')[2] ?? '';
  return (
    <ScrollView
      horizontal
      contentContainerStyle={styles.row}
      style={styles.bar}
      showsHorizontalScrollIndicator={false}
      role="navigation"
      aria-label="Admin sections"
    >
      {ADMIN_SECTIONS.map((s) => (
        <ToggleChip
          key={s.href}
          kind="link"
          icon={s.icon}
          label={s.label}
          selected={current === s.segment}
          onPress={() => router.navigate(s.href as never)}
          testID={`admin-section-${s.segment}`}
        />
      ))}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  bar: { flexGrow: 0 },
  row: {
    gap: spacing.sm,
    paddingHorizontal: spacing.lg,
    paddingTop: spacing.md,
    maxWidth: CONTENT_MAX_WIDTH,
    width: '100%',
    alignSelf: 'center',
  },
});
