import { useEffect, useRef } from 'react';

/**
 * Opens and closes a <dialog> as a modal with `isOpen`. `onShown` runs right after it opens (e.g. to move the
 * focus); the latest one is used.
 */
export function useModal(isOpen: boolean, onShown?: (dialog: HTMLDialogElement) => void) {
  const ref = useRef<HTMLDialogElement>(null);
  const shown = useRef(onShown);
  shown.current = onShown;
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (isOpen && !dialog.open) {
      dialog.showModal();
      shown.current?.(dialog);
    }
    if (!isOpen && dialog.open) dialog.close();
  }, [isOpen]);
  return ref;
}
