import { useSyncExternalStore } from 'react';

/** True while the media query matches; false where the browser cannot tell (tests, old engines). */
export function useMediaQuery(query: string): boolean {
  return useSyncExternalStore(
    (onChange) => {
      const list = typeof window === 'undefined' ? undefined : window.matchMedia?.(query);
      list?.addEventListener('change', onChange);
      return () => list?.removeEventListener('change', onChange);
    },
    () => (typeof window === 'undefined' ? false : (window.matchMedia?.(query).matches ?? false)),
    () => false,
  );
}

/** Below Tailwind's `md` breakpoint (768 px): a phone held upright. */
export const PHONE_QUERY = '(max-width: 767.98px)';
export const usePhone = () => useMediaQuery(PHONE_QUERY);
