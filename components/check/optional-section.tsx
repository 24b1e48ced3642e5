import { StyleSheet, View } from 'react-native';
import { List } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { SECTIONS, type SectionKey } from './check-sections';
import { setSectionField, useCheckForm } from './check-store';
import { SpecField } from './spec-field';

/** An optional block of facts (line set, electrical, site…), collapsed until the tech opens it. */
export function OptionalSection({ section }: { section: SectionKey }) {
  const form = useCheckForm();
  const def = SECTIONS[section];
  const values = form.sections[section];
  const filled = Object.values(values).filter((v) => v !== '').length;
  const hasError = Object.keys(form.errors).some((k) => k.startsWith(`${section}.`) || k === section);
  return (
    <List.Accordion
      title={def.title}
      titleNumberOfLines={2}
      description={hasError ? 'Needs attention' : filled ? `${filled} given` : 'Not given'}
      left={(p) => (
        <View aria-hidden>
          <List.Icon {...p} icon={hasError ? 'alert-circle-outline' : def.icon} />
        </View>
      )}
      // Paper draws its own chevron as an unnamed image; ours is hidden from assistive tech (the button says expanded).
      right={({ isExpanded }) => <DecorativeIcon source={isExpanded ? 'chevron-up' : 'chevron-down'} size={24} />}
      testID={`section-${section}`}
      style={styles.header}
    >
      <View style={styles.body}>
        {def.fields.map((f) => (
          <SpecField
            key={f.key}
            field={f}
            value={values[f.key] ?? ''}
            onChange={(v) => setSectionField(section, f.key, v)}
            error={form.errors[`${section}.${f.key}`]}
            testID={`${section}-field-${f.key}`}
          />
        ))}
      </View>
    </List.Accordion>
  );
}

const styles = StyleSheet.create({
  header: { minHeight: 56 },
  body: { gap: spacing.md, paddingHorizontal: spacing.sm, paddingBottom: spacing.md },
});
