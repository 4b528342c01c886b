import { useEffect, useRef, type RefObject } from 'react';
import { useLocation } from 'react-router-dom';

/**
 * After an in-app navigation, focus moves to the main region, as a full page load would reset it: a screen reader
 * then starts at the new page's content and a keyboard user does not tab through the header again. The first
 * render is skipped, so a fresh load keeps the browser's own behaviour.
 */
export function useFocusOnNavigate(target: RefObject<HTMLElement | null>) {
  const { pathname } = useLocation();
  const first = useRef(true);
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    target.current?.focus({ preventScroll: true });
  }, [pathname, target]);
}
