// Leaving the editor with unsaved changes asks first (in-app links) or lets the browser warn
// (closing the tab, reloading).
import { useEffect } from 'react';
import { useBlocker, type Blocker } from 'react-router';

export function useUnsavedGuard(when: boolean): Blocker {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => when && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!when) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [when]);
  return blocker;
}
