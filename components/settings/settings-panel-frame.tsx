import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { ActivityIndicator, Button } from 'react-native-paper';
import { TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';

interface Status {
  isPending: boolean;
  isError: boolean;
  error: unknown;
}

interface Props {
  title: string;
  subtitle: string;
  /** testID of the Save button at the top. */
  saveTestID: string;
  loadingLabel: string;
  /** Said once a save went through. */
  savedText: string;
  query: Status;
  save: Status;
  form: { draft: unknown; errors: Record<string, string>; saved: boolean; onSave(): void };
  children: ReactNode;
}

/** The frame of an Admin settings screen (Rules, Pricing): title, Save, loading, and what the last save said. */
export function SettingsPanelFrame({ title, subtitle, saveTestID, loadingLabel, savedText, query, save, form, children }: Props) {
  return (
    <Screen
      title={title}
      subtitle={subtitle}
      actions={
        <Button
          mode="contained"
          icon="content-save-outline"
          onPress={form.onSave}
          loading={save.isPending}
          disabled={!form.draft || save.isPending}
          contentStyle={styles.button}
          testID={saveTestID}
        >
          Save
        </Button>
      }
    >
      {query.isPending ? <ActivityIndicator accessibilityLabel={loadingLabel} /> : null}
      {query.isError ? <MessageBanner tone="error">{errorText(query.error)}</MessageBanner> : null}
      {save.isError ? <MessageBanner tone="error">{errorText(save.error)}</MessageBanner> : null}
      {form.saved ? <MessageBanner tone="success">{savedText}</MessageBanner> : null}
      {Object.keys(form.errors).length ? <MessageBanner tone="error">Some entries need fixing (marked below).</MessageBanner> : null}
      {children}
    </Screen>
  );
}

const styles = StyleSheet.create({ button: { minHeight: TOUCH_TARGET } });
