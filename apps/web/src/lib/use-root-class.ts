import { useEffect } from 'react';

/**
 * Puts a class on <html> while the page is shown. A page's stylesheet stays loaded after the page is left, so
 * print rules for the whole document (the root font size the rem-based spacing follows, the body's height) key on
 * this class and apply to that page alone.
 */
export function useRootClass(className: string): void {
  useEffect(() => {
    const root = document.documentElement;
    root.classList.add(className);
    return () => root.classList.remove(className);
  }, [className]);
}
