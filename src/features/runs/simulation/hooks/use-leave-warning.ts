// While a run is in progress its worker lives in this page: leaving the page ends it unsaved. The
// browser asks before the tab is closed or reloaded, and the app asks before it moves to another page.
import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';

export const LEAVE_WARNING =
  'A simulation is running in this page. Leaving stops it and nothing is saved. Leave anyway?';

export function useLeaveWarning(active: boolean): void {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => active && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    if (confirm(LEAVE_WARNING)) blocker.proceed();
    else blocker.reset();
  }, [blocker]);
  useEffect(() => {
    if (!active) return;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers show the dialog only when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [active]);
}
