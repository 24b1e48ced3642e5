import { useEffect, useRef, type RefObject } from 'react';
import type { View } from 'react-native';

const FOCUSABLE = 'button, [href], input, select, textarea, [tabindex]:not([tabindex="-1"])';

/**
 * While `active`, keeps keyboard focus inside the dialog (Tab and Shift+Tab wrap), closes on Escape,
 * and on close gives focus back to what had it before (WAI-ARIA modal dialog pattern).
 */
export function useFocusTrap(ref: RefObject<View | null>, active: boolean, onEscape: () => void): void {
  const escape = useRef(onEscape);
  escape.current = onEscape;
  useEffect(() => {
    if (!active) return;
    const previous = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const root = () => ref.current as unknown as HTMLElement | null;
    const focusables = () =>
      Array.from(root()?.querySelectorAll<HTMLElement>(FOCUSABLE) ?? []).filter((el) => !el.hasAttribute('disabled') && el.getAttribute('aria-disabled') !== 'true');
    // Once the dialog has painted (a portal may mount a few frames later): the first control, or the
    // dialog itself, takes focus. Tries for about a second before giving up.
    let start: ReturnType<typeof setTimeout> | undefined;
    const focusFirst = (triesLeft: number) => {
      const target = focusables()[0] ?? root();
      if (target) target.focus();
      if (!target?.contains(document.activeElement) && triesLeft > 0) start = setTimeout(() => focusFirst(triesLeft - 1), 50);
    };
    start = setTimeout(() => focusFirst(20), 0);
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') {
        e.preventDefault();
        escape.current();
        return;
      }
      if (e.key !== 'Tab') return;
      const list = focusables();
      if (!list.length) return e.preventDefault();
      const at = list.indexOf(document.activeElement as HTMLElement);
      if (e.shiftKey && at <= 0) {
        e.preventDefault();
        list[list.length - 1].focus();
      } else if (!e.shiftKey && (at === -1 || at === list.length - 1)) {
        e.preventDefault();
        list[0].focus();
      }
    };
    document.addEventListener('keydown', onKey, true);
    return () => {
      clearTimeout(start);
      document.removeEventListener('keydown', onKey, true);
      if (previous?.isConnected) previous.focus();
    };
  }, [active, ref]);
}
