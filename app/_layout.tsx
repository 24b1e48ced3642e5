import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { StatusBar } from 'expo-status-bar';
import { useEffect, useState } from 'react';
import { ActivityIndicator, useColorScheme, View } from 'react-native';
import { PaperProvider } from 'react-native-paper';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { ConnectionBanner } from '@/components/ui/connection-banner';
import { darkTheme, lightTheme } from '@/constants/theme';
import { createQueryClient } from '@/hooks/query-client';
import { persistOptions } from '@/hooks/query-persistence';
import { registerServiceWorker } from '@/hooks/register-service-worker';
import { SessionProvider } from '@/hooks/use-session';
import { useTextFonts } from '@/hooks/use-text-fonts';
import { PAPER_SETTINGS } from '@/components/ui/paper-icon';
import { RootNavigator } from '@/components/root/root-navigator';

/**
 * Root: the text fonts first (no flash of fallback text; on the web they are declared, not awaited — see
 * hooks/use-text-fonts.web.ts), then theme, data and session. The icon font (1.3 MB) does not hold up the
 * first screen: each icon loads it on its own and appears when it lands.
 */
export default function RootLayout() {
  const fontsLoaded = useTextFonts();
  const [queryClient] = useState(createQueryClient);
  const [persistence] = useState(persistOptions);
  const scheme = useColorScheme();
  const theme = scheme === 'dark' ? darkTheme : lightTheme;
  // Web production builds only: the next visit opens with no signal.
  useEffect(registerServiceWorker, []);

  if (!fontsLoaded) {
    return (
      <View style={{ flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: theme.colors.background }}>
        <ActivityIndicator color={theme.colors.primary} />
      </View>
    );
  }
  return (
    <SafeAreaProvider>
      <PersistQueryClientProvider client={queryClient} persistOptions={persistence}>
        <PaperProvider theme={theme} settings={PAPER_SETTINGS}>
          <SessionProvider>
            <StatusBar style={scheme === 'dark' ? 'light' : 'dark'} />
            <View style={{ flex: 1 }}>
              <ConnectionBanner />
              <RootNavigator background={theme.colors.background} />
            </View>
          </SessionProvider>
        </PaperProvider>
      </PersistQueryClientProvider>
    </SafeAreaProvider>
  );
}
