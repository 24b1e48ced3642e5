import { useFonts } from 'expo-font';
import { FONT_FILES } from '@/constants/theme';

/** True once the Inter text faces are loaded; the root shows a spinner until then (no flash of system text). */
export function useTextFonts(): boolean {
  const [loaded] = useFonts(FONT_FILES);
  return loaded;
}
