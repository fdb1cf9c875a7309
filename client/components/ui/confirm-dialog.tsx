import { useId, useRef, type ReactNode } from 'react';
import { Button } from './button';
import { useModal } from './use-modal';

type ConfirmDialogProps = {
  isOpen: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  isPending?: boolean;
  /** Shown inside the dialog, e.g. when the server refused. */
  error?: ReactNode;
  onConfirm: () => void;
  onCancel: () => void;
};

/** A modal question before a destructive step. Escape or Cancel backs out; focus starts on Cancel. */
export function ConfirmDialog({ isOpen, title, children, confirmLabel, isPending, error, onConfirm, onCancel }: ConfirmDialogProps) {
  const cancelRef = useRef<HTMLButtonElement>(null);
  const ref = useModal(isOpen, () => cancelRef.current?.focus());
  const titleId = useId();

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        if (!isPending) onCancel();
      }}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-xl bg-asphalt-850 p-0 text-asphalt-100 shadow-2xl ring-1 ring-asphalt-600"
    >
      <div className="p-5">
        <h2 id={titleId} className="text-lg font-semibold">
          {title}
        </h2>
        <div className="mt-2 text-[0.9375rem] text-asphalt-300">{children}</div>
        {error && <div className="mt-4">{error}</div>}
        <div className="mt-6 flex justify-end gap-2">
          <Button ref={cancelRef} onClick={onCancel} disabled={isPending}>
            Cancel
          </Button>
          <Button variant="danger" onClick={onConfirm} isPending={isPending}>
            {confirmLabel}
          </Button>
        </div>
      </div>
    </dialog>
  );
}
