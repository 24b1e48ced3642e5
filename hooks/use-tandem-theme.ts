import { useTheme } from 'react-native-paper';
import type { TandemTheme } from '@/constants/theme';

/** Paper's theme with Tandem's status colours. */
export const useTandemTheme = () => useTheme<TandemTheme>();
