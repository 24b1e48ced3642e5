import type { RefObject } from 'react';
import type { View } from 'react-native';

/** Native: the platform's modal handles focus; only the web build needs the trap (use-focus-trap.web.ts). */
export function useFocusTrap(_ref: RefObject<View | null>, _active: boolean, _onEscape: () => void): void {}
