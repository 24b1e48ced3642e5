import { Redirect, Slot } from 'expo-router';
import { useEffect } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { BottomTabs, SideRail } from '@/components/navigation/app-navigation';
import { useQueryClient } from '@tanstack/react-query';
import { preloadRoutes } from '@/hooks/preload-routes';
import { selectOutboxOwner, useOutboxSync } from '@/hooks/record-outbox';
import { useIsWide } from '@/hooks/use-layout';
import { useSession } from '@/hooks/use-session';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { whenIdle } from '@/hooks/when-idle';

/** Signed-in group: guard, then tabs at the bottom on a phone or a rail at the side on a wide screen. */
export default function SignedInLayout() {
  const { session, ready } = useSession();
  const wide = useIsWide();
  const theme = useTandemTheme();
  if (!ready) return <ActivityIndicator style={styles.fill} />;
  if (!session) return <Redirect href="/sign-in" />;
  selectOutboxOwner(session.user.id);
  return (
    <View style={[styles.fill, wide && styles.row, { backgroundColor: theme.colors.background }]}>
      {wide ? <SideRail /> : null}
      <View style={styles.fill}>
        <Slot />
      </View>
      {wide ? null : <BottomTabs />}
      <OutboxSync />
      <PreloadScreens />
    </View>
  );
}

/**
 * Web: every screen's chunk, so a screen first opened with no signal has its code (hooks/preload-routes.web.ts).
 * A second after this layout is up, then when idle: the first screen's own chunk goes first.
 */
function PreloadScreens() {
  useEffect(() => {
    let cancelIdle = () => {};
    const timer = setTimeout(() => (cancelIdle = whenIdle(preloadRoutes)), PRELOAD_AFTER_MS);
    return () => {
      clearTimeout(timer);
      cancelIdle();
    };
  }, []);
  return null;
}

const PRELOAD_AFTER_MS = 1000;

/** Sends record changes kept with no signal, now and whenever it returns (only here: a session is set). */
function OutboxSync() {
  useOutboxSync(useQueryClient());
  return null;
}

const styles = StyleSheet.create({ fill: { flex: 1 }, row: { flexDirection: 'row' } });
