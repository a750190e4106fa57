import { useEffect, type RefObject } from 'react';
import { useLocation } from 'react-router';

// The path whose heading was last shown: one page heading is on screen at a time.
let shownPath: string | null = null;

/**
 * After a move to another page (never on the first load, nor when a page re-renders in place) focus
 * goes to the new page's heading, so a screen reader says where the person landed and Tab goes on
 * from there. A page that put the cursor in a field itself (Scan's code field, for a USB scanner)
 * keeps it.
 */
export function useFocusOnNewPage(heading: RefObject<HTMLElement | null>) {
  const { pathname } = useLocation();
  useEffect(() => {
    const movedHere = shownPath !== null && shownPath !== pathname;
    shownPath = pathname;
    if (movedHere && !document.activeElement?.matches('main input, main select, main textarea')) heading.current?.focus();
  }, [heading, pathname]);
}
