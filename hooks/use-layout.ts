import { useWindowDimensions } from 'react-native';
import { WIDE_BREAKPOINT } from '@/constants/theme';

/** Phone (bottom tabs) or wide (side rail) layout, by window width. */
export function useIsWide(): boolean {
  const { width } = useWindowDimensions();
  return width >= WIDE_BREAKPOINT;
}
