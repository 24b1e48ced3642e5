import { onlineManager } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useIsWide } from '@/hooks/use-layout';
import { useRuleSettings } from '@/hooks/use-rule-settings';
import { AppDialog } from '@/components/ui/app-dialog';
import { MessageBanner } from '@/components/ui/message-banner';
import { buildCheckRequest } from './build-check-request';
import { CheckForm } from './check-form';
import { CheckFrame, CheckHeading } from './check-frame';
import { CheckResultView } from './check-result';
import { initialCheckForm, updateCheckForm, useCheckForm } from './check-store';
import { useCheckRunner } from './use-check-runner';

/** The driveway check: the form, one button, the answer (beside it on a wide screen, below it on a phone). */
export function CheckScreen() {
  const wide = useIsWide();
  const form = useCheckForm();
  const runner = useCheckRunner();
  // Fetched while there is a signal so an offline check runs with the shop's own settings.
  useRuleSettings();
  const scroll = useRef<ScrollView>(null);
  const resultY = useRef(0);
  const [confirmReset, setConfirmReset] = useState(false);
  // Set when a check answers on the phone; cleared once the page has scrolled to the verdict.
  const scrollPending = useRef(false);
  const scrollToVerdict = () => {
    if (!scrollPending.current || resultY.current <= 0) return;
    scrollPending.current = false;
    scroll.current?.scrollTo({ y: Math.max(0, resultY.current - spacing.md), animated: true });
  };
  // A result of the same height lays out at the same place (no new onLayout): scroll after the paint too.
  useEffect(() => {
    const t = setTimeout(scrollToVerdict, 80);
    return () => clearTimeout(t);
  }, [form.outcome]);

  const onCheck = () => {
    const built = buildCheckRequest(form);
    if (!built.ok) {
      updateCheckForm((s) => ({ ...s, errors: built.errors }));
      return;
    }
    const input = { request: built.request, picked: built.picked };
    // Known to be offline: answer on the phone in this very tap (one render, no pending state).
    if (!onlineManager.isOnline()) {
      try {
        const outcome = runner.onDevice(input);
        if (runner.mutation.status !== 'idle') runner.mutation.reset();
        updateCheckForm((s) => ({ ...s, errors: {}, outcome }));
        scrollPending.current = !wide;
        return;
      } catch {
        // Falls through to the mutation, which reports the problem in words.
      }
    }
    if (Object.keys(form.errors).length) updateCheckForm((s) => ({ ...s, errors: {} }));
    runner.mutation.mutate(input, {
      onSuccess: (outcome) => {
        scrollPending.current = !wide;
        updateCheckForm((s) => ({ ...s, outcome }));
      },
    });
  };

  const outdoor = form.parts.outdoor;
  const refrigerant = String((outdoor.mode === 'catalog' ? outdoor.picked?.spec.refrigerant : outdoor.typed.refrigerant) ?? '');
  const errorCount = Object.keys(form.errors).length;
  const status = (
    <>
      {errorCount ? (
        <MessageBanner tone="error" testID="form-errors">
          {`${errorCount === 1 ? 'One entry needs' : `${errorCount} entries need`} fixing before the check can run (marked ⚠ above).`}
        </MessageBanner>
      ) : null}
      {runner.mutation.isError ? <MessageBanner tone="error">{errorText(runner.mutation.error)}</MessageBanner> : null}
    </>
  );
  const result = form.outcome ? (
    <View
      onLayout={(e) => {
        resultY.current = e.nativeEvent.layout.y;
        scrollToVerdict();
      }}
    >
      <CheckResultView outcome={form.outcome} systemRefrigerant={refrigerant} />
    </View>
  ) : null;
  // Clearing a half-typed driveway check by a stray tap would cost the tech the nameplates: ask first.
  const reset = (
    <>
      <Button mode="outlined" icon="restart" onPress={() => setConfirmReset(true)} contentStyle={styles.button} testID="check-reset">
        Start over
      </Button>
      <AppDialog
        visible={confirmReset}
        onDismiss={() => setConfirmReset(false)}
        title="Start over?"
        testID="check-reset-dialog"
        actions={
          <>
            <Button onPress={() => setConfirmReset(false)} contentStyle={styles.button} testID="check-reset-cancel">
              Keep the form
            </Button>
            <Button
              mode="contained"
              onPress={() => {
                setConfirmReset(false);
                runner.mutation.reset();
                updateCheckForm(() => initialCheckForm());
              }}
              contentStyle={styles.button}
              testID="check-reset-confirm"
            >
              Start over
            </Button>
          </>
        }
      >
        <Text variant="bodyMedium">This clears every part, entry and the answer on this phone. It can not be undone.</Text>
      </AppDialog>
    </>
  );

  if (wide) {
    return (
      <CheckFrame>
        <View style={styles.wideHead}>
          <CheckHeading actions={reset} />
        </View>
        <View style={styles.columns}>
          <ScrollView style={styles.column} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled">
            <CheckForm onCheck={onCheck} busy={runner.mutation.isPending} />
            {status}
          </ScrollView>
          <ScrollView style={styles.column} contentContainerStyle={styles.columnContent}>
            {result ?? (
              <Text variant="bodyLarge" style={styles.placeholder}>
                Pick the parts and tap Check: the answer appears here.
              </Text>
            )}
          </ScrollView>
        </View>
      </CheckFrame>
    );
  }
  return (
    <CheckFrame>
      <ScrollView ref={scroll} style={styles.fill} contentContainerStyle={styles.phoneContent} keyboardShouldPersistTaps="handled">
        <CheckHeading actions={reset} />
        <CheckForm onCheck={onCheck} busy={runner.mutation.isPending} />
        {status}
        {result}
      </ScrollView>
    </CheckFrame>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, minHeight: 0 },
  phoneContent: { gap: spacing.lg, padding: spacing.lg, paddingBottom: spacing.xxl },
  wideHead: { padding: spacing.lg, paddingBottom: 0 },
  columns: { flex: 1, minHeight: 0, flexDirection: 'row', gap: spacing.xl, paddingHorizontal: spacing.lg },
  column: { flex: 1, minHeight: 0 },
  columnContent: { gap: spacing.lg, paddingTop: spacing.lg, paddingBottom: spacing.xxl, paddingRight: spacing.sm },
  placeholder: { paddingTop: spacing.xl },
  button: { minHeight: TOUCH_TARGET },
});
