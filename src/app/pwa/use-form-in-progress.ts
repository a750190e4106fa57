import { useEffect, useState } from 'react';

/**
 * Whether the member has typed into a form that is still on screen and not sent yet. A form counts
 * from its first input until it is submitted, reset or leaves the page.
 */
export function useFormInProgress(): boolean {
  const [inProgress, setInProgress] = useState(false);
  useEffect(() => {
    const touched = new Set<HTMLFormElement>();
    const gone = new MutationObserver(() => {
      for (const form of touched) if (!form.isConnected) touched.delete(form);
      settle();
    });
    const settle = () => {
      setInProgress(touched.size > 0);
      if (touched.size === 0) gone.disconnect();
    };
    const onInput = (event: Event) => {
      const form = event.target instanceof Element ? event.target.closest('form') : null;
      if (!form || touched.has(form)) return;
      touched.add(form);
      gone.observe(document.body, { childList: true, subtree: true });
      settle();
    };
    const onDone = (event: Event) => {
      if (event.target instanceof HTMLFormElement && touched.delete(event.target)) settle();
    };
    document.addEventListener('input', onInput, true);
    document.addEventListener('submit', onDone, true);
    document.addEventListener('reset', onDone, true);
    return () => {
      gone.disconnect();
      document.removeEventListener('input', onInput, true);
      document.removeEventListener('submit', onDone, true);
      document.removeEventListener('reset', onDone, true);
    };
  }, []);
  return inProgress;
}
