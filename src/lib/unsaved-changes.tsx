import { useCallback, useEffect, useRef } from 'react';
import { useBlocker } from 'react-router-dom';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';

/**
 * Keeps unsaved work from being lost by a link, Back or Forward (a dialog of our own) or by
 * closing or reloading the tab (the browser's own question, through `beforeunload`).
 * `release()` lets the next navigation through, for the one that follows a save.
 */
export function useUnsavedChanges(dirty: boolean | (() => boolean), { keptAsDraft = false } = {}) {
  const released = useRef(false);
  // A function is asked at the moment of leaving: work typed a moment before Back counts even
  // if the page has not drawn again since.
  const isDirty = typeof dirty === 'function' ? dirty : () => dirty;
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      isDirty() && !released.current && currentLocation.pathname !== nextLocation.pathname,
  );
  const latest = useRef(isDirty);
  useEffect(() => {
    latest.current = isDirty;
  });

  useEffect(() => {
    const warn = (event: BeforeUnloadEvent) => {
      if (released.current || !latest.current()) return;
      event.preventDefault();
      // Older browsers show the question only when a value is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, []);

  const release = useCallback(() => {
    released.current = true;
  }, []);

  const dialog = (
    <ConfirmDialog
      open={blocker.state === 'blocked'}
      title="Leave without saving?"
      confirmLabel="Leave this page"
      cancelLabel="Stay and keep editing"
      danger
      onConfirm={() => blocker.proceed?.()}
      onCancel={() => blocker.reset?.()}
    >
      Your changes on this page are not saved.
      {keptAsDraft
        ? ' A copy stays in this tab until you save or discard it: coming back here brings them back.'
        : ' Leaving discards them.'}
    </ConfirmDialog>
  );
  return { release, dialog };
}

/** A draft of a form kept in this tab's sessionStorage, so Back then Forward brings it back. */
export function formDraft<T>(key: string) {
  const storageKey = `printwarden:draft:${key}`;
  return {
    read(): T | null {
      try {
        const text = sessionStorage.getItem(storageKey);
        return text ? (JSON.parse(text) as T) : null;
      } catch {
        return null;
      }
    },
    write(value: T) {
      try {
        sessionStorage.setItem(storageKey, JSON.stringify(value));
      } catch {
        // A full or blocked storage only loses the draft, never the page.
      }
    },
    clear() {
      sessionStorage.removeItem(storageKey);
    },
  };
}
