import MaterialCommunityIcons from '@expo/vector-icons/MaterialCommunityIcons';
import type { ComponentProps } from 'react';
import type { PaperProvider } from 'react-native-paper';

type Settings = NonNullable<ComponentProps<typeof PaperProvider>['settings']>;
type IconProps = Parameters<NonNullable<Settings['icon']>>[0];

/**
 * Every icon Paper draws (in buttons, accordions, chips), hidden from assistive tech: Paper's default
 * marks each one role="img" with no name, and the control around it already carries the words.
 */
export function PaperIcon({ name, color, size, direction, allowFontScaling, testID }: IconProps) {
  return (
    <MaterialCommunityIcons
      name={name}
      color={color}
      size={size}
      allowFontScaling={allowFontScaling}
      testID={testID}
      style={{ transform: [{ scaleX: direction === 'rtl' ? -1 : 1 }], lineHeight: size, backgroundColor: 'transparent' }}
      pointerEvents="none"
      selectable={false}
      aria-hidden
    />
  );
}

/** The PaperProvider settings the app runs with. */
export const PAPER_SETTINGS: Settings = { icon: PaperIcon };
