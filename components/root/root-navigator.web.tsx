import { Slot } from 'expo-router';
import { StyleSheet, View } from 'react-native';

/**
 * Web: a Slot, not a Stack. The browser keeps the history, and a web Stack shows one screen at a time anyway,
 * but it renders react-navigation's native-stack view (react-native-screens, Animated, header machinery) on
 * every boot: about a tenth of a throttled first load. The signed-in group was already a Slot.
 */
export function RootNavigator({ background }: { background: string }) {
  return (
    <View style={[styles.fill, { backgroundColor: background }]}>
      <Slot />
    </View>
  );
}

const styles = StyleSheet.create({ fill: { flex: 1 } });
