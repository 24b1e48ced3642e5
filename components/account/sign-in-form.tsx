import { useEffect, useState } from 'react';
import { KeyboardAvoidingView, ScrollView, StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { SignInSchema } from '@/shared/schemas/auth';
import { errorText } from '@/hooks/error-text';
import { useSession } from '@/hooks/use-session';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { preloadRoutes } from '@/hooks/preload-routes';
import { useZodForm } from '@/hooks/use-zod-form';
import { whenIdle } from '@/hooks/when-idle';
import { FormField } from '@/components/ui/form-field';
import { MessageBanner } from '@/components/ui/message-banner';

/**
 * The schema, behind a function: zod is the largest module the first screen would evaluate, and the form
 * needs it only to validate. It is loaded once the form is on screen and the browser is idle, and so are the
 * other screens' chunks (hooks/preload-routes.web.ts), so that opening them later works with no signal.
 */
const signInSchema = () => SignInSchema;

export function SignInForm() {
  const theme = useTandemTheme();
  const { signIn } = useSession();
  const form = useZodForm(signInSchema, { email: '', password: '' });
  useEffect(
    () =>
      whenIdle(() => {
        signInSchema();
        preloadRoutes();
      }),
    [],
  );
  const [failure, setFailure] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    setFailure(null);
    const input = form.validate();
    if (!input) return;
    setBusy(true);
    try {
      await signIn(input);
    } catch (err) {
      setFailure(errorText(err));
    } finally {
      setBusy(false);
    }
  };

  return (
    <KeyboardAvoidingView style={[styles.fill, { backgroundColor: theme.colors.background }]} behavior="padding">
      <ScrollView contentContainerStyle={styles.center} keyboardShouldPersistTaps="handled">
        <View style={[styles.card, { backgroundColor: theme.colors.surface, borderColor: theme.colors.outlineVariant }]}>
          <View style={styles.heading}>
            <Text variant="displaySmall" role="heading" aria-level={1} style={{ color: theme.colors.primary }}>
              Tandem
            </Text>
            <Text variant="bodyLarge" style={{ color: theme.colors.onSurfaceVariant }}>
              Will these parts work together? Sign in to check a system.
            </Text>
          </View>
          {failure ? (
            <MessageBanner tone="error" testID="sign-in-error">
              {failure}
            </MessageBanner>
          ) : null}
          <FormField
            label="E-mail"
            testID="sign-in-email"
            {...form.bind('email')}
            autoCapitalize="none"
            autoComplete="email"
            keyboardType="email-address"
            inputMode="email"
          />
          <FormField
            label="Password"
            testID="sign-in-password"
            {...form.bind('password')}
            secureTextEntry
            autoComplete="current-password"
            onSubmitEditing={submit}
          />
          <Button mode="contained" onPress={submit} loading={busy} disabled={busy} testID="sign-in-submit" contentStyle={styles.button}>
            Sign in
          </Button>
        </View>
      </ScrollView>
    </KeyboardAvoidingView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  center: { flexGrow: 1, justifyContent: 'center', padding: spacing.lg },
  card: { width: '100%', maxWidth: 440, alignSelf: 'center', padding: spacing.xl, borderRadius: 16, borderWidth: 1, gap: spacing.md },
  heading: { gap: spacing.xs, marginBottom: spacing.sm },
  button: { minHeight: TOUCH_TARGET },
});
