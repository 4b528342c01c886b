import { useEffect } from 'react';

/** Tab titles tell pages apart in the history list and are the first thing a screen reader announces. */
export function usePageTitle(title: string) {
  useEffect(() => {
    document.title = `${title} · Coldknit`;
  }, [title]);
}
