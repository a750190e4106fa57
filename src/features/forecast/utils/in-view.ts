import { useEffect, useRef, useState } from 'react';

/**
 * True once the element has come near the screen, and stays true: a long list of bins draws its
 * charts as they scroll into view, not all at once. Without IntersectionObserver it is true at once.
 */
export function useSeenOnce<T extends Element>(margin = '200px') {
  const ref = useRef<T>(null);
  const [seen, setSeen] = useState(() => typeof IntersectionObserver === 'undefined');
  useEffect(() => {
    const el = ref.current;
    if (seen || !el) return;
    const observer = new IntersectionObserver(
      (entries) => {
        if (entries.some((e) => e.isIntersecting)) {
          setSeen(true);
          observer.disconnect();
        }
      },
      { rootMargin: margin },
    );
    observer.observe(el);
    return () => observer.disconnect();
  }, [seen, margin]);
  return { ref, seen };
}
