import { Stack } from 'expo-router';

/** Native: the root stack (sign-in, the signed-in group, not-found), no headers: each screen draws its own. */
export function RootNavigator({ background }: { background: string }) {
  return <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: background } }} />;
}
