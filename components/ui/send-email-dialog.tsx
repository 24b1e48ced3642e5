import { StyleSheet } from 'react-native';
import { Button } from 'react-native-paper';
import { TOUCH_TARGET } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { AppDialog } from './app-dialog';
import { FormField } from './form-field';
import { MessageBanner } from './message-banner';

interface Props {
  visible: boolean;
  title: string;
  /** testIDs: `<prefix>-dialog`, `<prefix>-to`, `<prefix>-confirm`, `<prefix>-again`. */
  testIdPrefix: string;
  address: string;
  addressError?: string;
  /** The server's "sent under a minute ago" question; the button then sends with confirm. */
  askAgain: string | null;
  pending: boolean;
  error: unknown;
  onAddressChange(value: string): void;
  onSend(confirm: boolean): void;
  onDismiss(): void;
}

/** E-mailing a PDF to the customer (record report, proposal): the address, Send, and "Send again" when asked. */
export function SendEmailDialog(p: Props) {
  return (
    <AppDialog
      visible={p.visible}
      onDismiss={p.onDismiss}
      title={p.title}
      testID={`${p.testIdPrefix}-dialog`}
      actions={
        <>
          <Button onPress={p.onDismiss} contentStyle={styles.button}>
            Cancel
          </Button>
          {p.askAgain ? (
            <Button mode="contained" onPress={() => p.onSend(true)} loading={p.pending} contentStyle={styles.button} testID={`${p.testIdPrefix}-again`}>
              Send again
            </Button>
          ) : (
            <Button mode="contained" onPress={() => p.onSend(false)} loading={p.pending} contentStyle={styles.button} testID={`${p.testIdPrefix}-confirm`}>
              Send
            </Button>
          )}
        </>
      }
    >
      <FormField
        label="Send to"
        value={p.address}
        onChangeText={p.onAddressChange}
        error={p.addressError}
        keyboardType="email-address"
        autoCapitalize="none"
        testID={`${p.testIdPrefix}-to`}
      />
      {p.askAgain ? <MessageBanner tone="info">{p.askAgain}</MessageBanner> : null}
      {p.error && !p.askAgain ? <MessageBanner tone="error">{errorText(p.error)}</MessageBanner> : null}
    </AppDialog>
  );
}

const styles = StyleSheet.create({ button: { minHeight: TOUCH_TARGET } });
