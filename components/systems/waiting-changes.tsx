import { StyleSheet, View } from 'react-native';
import { Button, Text } from 'react-native-paper';
import { spacing, TOUCH_TARGET } from '@/constants/theme';
import { dropQueued, type RecordOutboxItem } from '@/hooks/record-outbox';
import { waitingCount } from '@/hooks/record-outbox-queue';
import { useIsOnline } from '@/hooks/use-connection';
import { MessageBanner } from '@/components/ui/message-banner';
import { waitingBanner, waitingItemText } from './waiting-words';

/** What this record has kept on the phone for later: a count, each item, and a refused one to discard. */
export function WaitingChanges({ systemId, items, sendingId }: { systemId: number; items: RecordOutboxItem[]; sendingId: string | undefined }) {
  const online = useIsOnline();
  const mine = items.filter((i) => i.kind !== 'create' && i.systemId === systemId);
  if (mine.length === 0) return null;
  const count = waitingCount(items, systemId);
  const held = mine.some((i) => i.problem);
  return (
    <View style={styles.box} testID="record-waiting">
      <MessageBanner tone={held ? 'error' : 'info'} testID="record-waiting-count">
        {waitingBanner(count, { online, sending: mine.some((i) => i.id === sendingId), held })}
      </MessageBanner>
      {mine.map((item) => (
        <View key={item.id} style={styles.item} testID={`waiting-${item.kind}`}>
          <Text variant="bodyMedium">{waitingItemText(item)}</Text>
          {item.problem?.kind === 'refused' ? (
            <>
              <Text variant="bodySmall">{`The server refused it: ${item.problem.message}`}</Text>
              <Button mode="outlined" onPress={() => dropQueued(item.id)} contentStyle={styles.button}>
                Discard this change
              </Button>
            </>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.xs }, item: { gap: 2 }, button: { minHeight: TOUCH_TARGET } });
