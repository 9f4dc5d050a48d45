import { useEffect, useRef } from 'react';
import { useLocation, useNavigationType } from 'react-router';

/**
 * Moves focus to the main region after an in-app navigation (a link, a redirect after sign-in),
 * so keyboard and screen-reader users start at the new page's content instead of the link they
 * left behind. The first page load and back/forward ("POP") leave focus where the browser puts it.
 * A page that moves focus itself (to an element marked `data-route-focus`, such as a planner
 * step's heading) keeps it.
 */
export function useFocusMainOnNavigate<T extends HTMLElement>() {
  const mainRef = useRef<T>(null);
  const { pathname } = useLocation();
  const navigationType = useNavigationType();

  useEffect(() => {
    if (navigationType === 'POP') return;
    const focused = document.activeElement;
    if (focused instanceof HTMLElement && focused.hasAttribute('data-route-focus')) {
      if (mainRef.current?.contains(focused)) return;
    }
    mainRef.current?.focus({ preventScroll: true });
  }, [pathname, navigationType]);

  return mainRef;
}
