'use client';

import { useEffect } from 'react';

export const UNSAVED_MESSAGE = 'This schedule has unsaved changes. Leave without saving them?';

/**
 * Asks before unsaved edits are lost: on reload or closing the tab (beforeunload), on a link to
 * another page, and on the browser's Back button (a guard history entry is pushed while dirty).
 */
export function useUnsavedWarning(dirty: boolean) {
  useEffect(() => {
    if (!dirty) return;
    let leaving = false;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      event.preventDefault();
    };
    const onClick = (event: MouseEvent) => {
      const link = (event.target as Element | null)?.closest?.('a[href]');
      if (!link || link.getAttribute('target') === '_blank') return;
      const url = new URL((link as HTMLAnchorElement).href, location.href);
      if (url.origin !== location.origin || url.pathname === location.pathname) return;
      if (!confirm(UNSAVED_MESSAGE)) {
        event.preventDefault();
        event.stopPropagation();
      } else leaving = true;
    };
    // Keep the router's own state on the guard entry so it treats it as this same page.
    history.pushState({ ...history.state, unsavedGuard: true }, '', location.href);
    const onPopState = () => {
      if (leaving) return;
      if (confirm(UNSAVED_MESSAGE)) {
        leaving = true;
        history.back();
      } else history.pushState({ ...history.state, unsavedGuard: true }, '', location.href);
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    document.addEventListener('click', onClick, true);
    window.addEventListener('popstate', onPopState);
    return () => {
      window.removeEventListener('beforeunload', onBeforeUnload);
      document.removeEventListener('click', onClick, true);
      window.removeEventListener('popstate', onPopState);
    };
  }, [dirty]);
}
