import { useEffect } from 'react';

/**
 * Puts a class on <html> while the page is shown. Print styles that size the whole sheet (the root font size the
 * rem-based spacing follows) key on it: Chromium does not apply `html:has(…)` when it lays out a page for printing.
 */
export function useRootClass(className: string): void {
  useEffect(() => {
    const root = document.documentElement;
    root.classList.add(className);
    return () => root.classList.remove(className);
  }, [className]);
}
