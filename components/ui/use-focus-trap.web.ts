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
    // Something behind the dialog taking focus by script (Paper's Menu focuses its anchor when its
    // hide animation ends, even on mount) is sent back in; popups of the dialog's own are left alone.
    const onFocusIn = (e: FocusEvent) => {
      const box = root();
      const target = e.target instanceof HTMLElement ? e.target : null;
      if (!box || !target || box.contains(target) || target.closest('[role=menu],[role=listbox]')) return;
      (focusables()[0] ?? box).focus();
    };
    document.addEventListener('keydown', onKey, true);
    document.addEventListener('focusin', onFocusIn, true);
    return () => {
      clearTimeout(start);
      document.removeEventListener('keydown', onKey, true);
      document.removeEventListener('focusin', onFocusIn, true);
      if (previous?.isConnected) previous.focus();
    };
  }, [active, ref]);
}
