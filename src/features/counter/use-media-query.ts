import { useCallback, useSyncExternalStore } from 'react';

const hasMatchMedia = (): boolean => typeof window.matchMedia === 'function';

/** Whether a CSS media query matches now, following the window as it changes (a phone turned sideways). */
export function useMediaQuery(query: string): boolean {
  const subscribe = useCallback(
    (onChange: () => void) => {
      if (!hasMatchMedia()) return () => {};
      const list = window.matchMedia(query);
      list.addEventListener('change', onChange);
      return () => list.removeEventListener('change', onChange);
    },
    [query],
  );
  // Where there is no matchMedia (a test's jsdom) the screen counts as wide.
  return useSyncExternalStore(subscribe, () => !hasMatchMedia() || window.matchMedia(query).matches);
}
