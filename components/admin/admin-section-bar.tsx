import { usePathname, useRouter } from 'expo-router';
import { ScrollView, StyleSheet } from 'react-native';
import { Chip } from 'react-native-paper';
import { ADMIN_SECTIONS } from '@/constants/navigation';
import { CONTENT_MAX_WIDTH, spacing, TOUCH_TARGET } from '@/constants/theme';

/** The Admin sections as a row of selectable chips (scrolls sideways on a narrow phone). */
export function AdminSectionBar() {
  const pathname = usePathname();
  const router = useRouter();
  const current = pathname.split('/')[2] ?? '';
  return (
    <ScrollView horizontal contentContainerStyle={styles.row} style={styles.bar} showsHorizontalScrollIndicator={false}>
      {ADMIN_SECTIONS.map((s) => (
        <Chip
          key={s.href}
          icon={s.icon}
          selected={current === s.segment}
          showSelectedOverlay
          onPress={() => router.navigate(s.href as never)}
          style={styles.chip}
          testID={`admin-section-${s.segment}`}
        >
          {s.label}
        </Chip>
      ))}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  bar: { flexGrow: 0 },
  row: { gap: spacing.sm, paddingHorizontal: spacing.lg, paddingTop: spacing.md, maxWidth: CONTENT_MAX_WIDTH, width: '100%', alignSelf: 'center' },
  chip: { minHeight: TOUCH_TARGET - 8, justifyContent: 'center' },
});
