import { MIN_TARGET_PX } from './target-size';
import { configureFonts, MD3DarkTheme, MD3LightTheme, type MD3Theme } from 'react-native-paper';

/**
 * Tandem's design tokens: the one place for palette, type scale, shapes and spacing.
 * Palette: a deep "night-service" blue for actions, copper (the tubing) as the accent; strong
 * contrast for reading outdoors. Severity colours always travel with a word and an icon.
 */

export const FONT_FILES = {
  'Inter-Regular': require('../assets/fonts/Inter_400Regular.ttf'),
  'Inter-Medium': require('../assets/fonts/Inter_500Medium.ttf'),
  'Inter-SemiBold': require('../assets/fonts/Inter_600SemiBold.ttf'),
  'Inter-Bold': require('../assets/fonts/Inter_700Bold.ttf'),
};

export const spacing = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;
export { MIN_TARGET_PX } from './target-size';
/** The shared minimum target (px) under its older name, kept so existing styles read on. */
export const TOUCH_TARGET = MIN_TARGET_PX;
/** Below this width the app uses bottom tabs; at or above, a side rail. */
export const WIDE_BREAKPOINT = 768;
export const CONTENT_MAX_WIDTH = 1200;

const fonts = configureFonts({
  config: {
    displayLarge: { fontFamily: 'Inter-Bold', fontSize: 40, lineHeight: 48, letterSpacing: -0.5, fontWeight: '700' },
    displayMedium: { fontFamily: 'Inter-Bold', fontSize: 34, lineHeight: 42, letterSpacing: -0.25, fontWeight: '700' },
    displaySmall: { fontFamily: 'Inter-SemiBold', fontSize: 28, lineHeight: 36, letterSpacing: 0, fontWeight: '600' },
    headlineLarge: { fontFamily: 'Inter-SemiBold', fontSize: 26, lineHeight: 34, letterSpacing: 0, fontWeight: '600' },
    headlineMedium: { fontFamily: 'Inter-SemiBold', fontSize: 23, lineHeight: 30, letterSpacing: 0, fontWeight: '600' },
    headlineSmall: { fontFamily: 'Inter-SemiBold', fontSize: 20, lineHeight: 28, letterSpacing: 0, fontWeight: '600' },
    titleLarge: { fontFamily: 'Inter-SemiBold', fontSize: 19, lineHeight: 26, letterSpacing: 0, fontWeight: '600' },
    titleMedium: { fontFamily: 'Inter-SemiBold', fontSize: 17, lineHeight: 24, letterSpacing: 0.1, fontWeight: '600' },
    titleSmall: { fontFamily: 'Inter-Medium', fontSize: 15, lineHeight: 22, letterSpacing: 0.1, fontWeight: '500' },
    labelLarge: { fontFamily: 'Inter-SemiBold', fontSize: 16, lineHeight: 22, letterSpacing: 0.1, fontWeight: '600' },
    labelMedium: { fontFamily: 'Inter-Medium', fontSize: 14, lineHeight: 20, letterSpacing: 0.2, fontWeight: '500' },
    labelSmall: { fontFamily: 'Inter-Medium', fontSize: 13, lineHeight: 18, letterSpacing: 0.2, fontWeight: '500' },
    bodyLarge: { fontFamily: 'Inter-Regular', fontSize: 17, lineHeight: 25, letterSpacing: 0, fontWeight: '400' },
    bodyMedium: { fontFamily: 'Inter-Regular', fontSize: 16, lineHeight: 23, letterSpacing: 0, fontWeight: '400' },
    bodySmall: { fontFamily: 'Inter-Regular', fontSize: 14, lineHeight: 20, letterSpacing: 0.1, fontWeight: '400' },
  },
});

/** Severity and verdict colours (used with words and icons, never alone). */
export interface StatusColors {
  blocker: string;
  onBlocker: string;
  blockerContainer: string;
  caution: string;
  onCaution: string;
  cautionContainer: string;
  info: string;
  infoContainer: string;
  ok: string;
  okContainer: string;
}

export type TandemTheme = MD3Theme & { status: StatusColors };

export const lightTheme: TandemTheme = {
  ...MD3LightTheme,
  roundness: 3,
  fonts,
  colors: {
    ...MD3LightTheme.colors,
    primary: '#23406E',
    onPrimary: '#FFFFFF',
    primaryContainer: '#D9E3F6',
    onPrimaryContainer: '#0C1D38',
    secondary: '#9A5224',
    onSecondary: '#FFFFFF',
    secondaryContainer: '#F6DFCF',
    onSecondaryContainer: '#3A1A05',
    tertiary: '#2F6B4F',
    onTertiary: '#FFFFFF',
    tertiaryContainer: '#D3EEDD',
    onTertiaryContainer: '#0A2A1A',
    background: '#F6F7F9',
    onBackground: '#15181D',
    surface: '#FFFFFF',
    onSurface: '#15181D',
    surfaceVariant: '#E6E9EF',
    onSurfaceVariant: '#3E4450',
    outline: '#6C7380',
    outlineVariant: '#C6CBD4',
    error: '#B0271D',
    onError: '#FFFFFF',
    errorContainer: '#FADAD6',
    onErrorContainer: '#410703',
    elevation: {
      level0: 'transparent',
      level1: '#F1F3F7',
      level2: '#EBEEF3',
      level3: '#E5E9EF',
      level4: '#E2E6ED',
      level5: '#DDE2EA',
    },
  },
  status: {
    blocker: '#A8231A',
    onBlocker: '#FFFFFF',
    blockerContainer: '#FBE1DD',
    caution: '#8A5300',
    onCaution: '#FFFFFF',
    cautionContainer: '#FCEBC8',
    info: '#2A5590',
    infoContainer: '#DEE8F7',
    ok: '#1F6A44',
    okContainer: '#D5EFDF',
  },
};

export const darkTheme: TandemTheme = {
  ...MD3DarkTheme,
  roundness: 3,
  fonts,
  colors: {
    ...MD3DarkTheme.colors,
    primary: '#A9C4F2',
    onPrimary: '#0C1D38',
    primaryContainer: '#2E4B7A',
    onPrimaryContainer: '#D9E3F6',
    secondary: '#F0B48A',
    onSecondary: '#3A1A05',
    secondaryContainer: '#6E3A17',
    onSecondaryContainer: '#F6DFCF',
    tertiary: '#9BD6B5',
    onTertiary: '#0A2A1A',
    background: '#101317',
    onBackground: '#E7E9ED',
    surface: '#181C22',
    onSurface: '#E7E9ED',
    surfaceVariant: '#2A3039',
    onSurfaceVariant: '#C3C8D1',
    outline: '#8D94A0',
    outlineVariant: '#3F4651',
    error: '#FFB4AA',
    onError: '#5F1109',
    errorContainer: '#8C1D14',
    onErrorContainer: '#FFDAD5',
  },
  status: {
    blocker: '#FFB4AA',
    onBlocker: '#5F1109',
    blockerContainer: '#5B1510',
    caution: '#F5C26B',
    onCaution: '#3B2500',
    cautionContainer: '#4A3200',
    info: '#A9C4F2',
    infoContainer: '#1E3356',
    ok: '#8FD6AD',
    okContainer: '#12392A',
  },
};
