import { Button, Group, Modal, Text } from '@mantine/core';
import { useEffect, useRef } from 'react';
import { useBlocker } from 'react-router-dom';

interface UnsavedChangesGuardOptions {
  /** There are edits that are not saved. */
  dirty: boolean;
  what: string;
}

/**
 * Asks before the designer leaves a page with unsaved edits: a dialog for a link or the back button inside the
 * app, the browser's own prompt for a reload or a closed tab. `allow()` lets the page's own navigation through
 * (to the saved device's address after a save).
 */
export function useUnsavedChangesGuard({ dirty, what }: UnsavedChangesGuardOptions) {
  const allowed = useRef(false);
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && !allowed.current && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!dirty) return undefined;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);
  const dialog = (
    <Modal opened={blocker.state === 'blocked'} onClose={() => blocker.reset?.()} title="Leave without saving?" centered>
      <Text size="sm">Your changes to {what} are not saved. They are lost if you leave this page.</Text>
      <Group justify="flex-end" gap="xs" mt="md">
        <Button variant="default" size="xs" onClick={() => blocker.reset?.()} data-autofocus>
          Stay on this page
        </Button>
        <Button color="red" size="xs" onClick={() => blocker.proceed?.()}>
          Leave without saving
        </Button>
      </Group>
    </Modal>
  );
  return {
    dialog,
    allow: () => {
      allowed.current = true;
    },
  };
}
