import { useId, type FormEvent, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { useModal } from '../../../components/ui/use-modal';

type FormDialogProps = {
  isOpen: boolean;
  title: string;
  description?: ReactNode;
  submitLabel: string;
  isPending?: boolean;
  /** Shown above the buttons, e.g. when the server refused. */
  error?: ReactNode;
  onSubmit: () => void;
  onCancel: () => void;
  children: ReactNode;
};

/** A modal form: Enter submits, Escape or Cancel backs out, focus starts on the first field. */
export function FormDialog({ isOpen, title, description, submitLabel, isPending, error, onSubmit, onCancel, children }: FormDialogProps) {
  const ref = useModal(isOpen, (dialog) => dialog.querySelector<HTMLElement>('input, select, textarea')?.focus());
  const titleId = useId();

  function submit(e: FormEvent) {
    e.preventDefault();
    if (!isPending) onSubmit();
  }

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        if (!isPending) onCancel();
      }}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-xl bg-asphalt-850 p-0 text-asphalt-100 shadow-2xl ring-1 ring-asphalt-600"
    >
      {isOpen && (
        <form noValidate onSubmit={submit} className="p-5">
          <h2 id={titleId} className="text-lg font-semibold">
            {title}
          </h2>
          {description && <div className="mt-1 text-[0.9375rem] text-asphalt-400">{description}</div>}
          <div className="mt-4 flex flex-col gap-4">{children}</div>
          {error && <div className="mt-4">{error}</div>}
          <div className="mt-6 flex justify-end gap-2">
            <Button onClick={onCancel} disabled={isPending}>
              Cancel
            </Button>
            <Button type="submit" variant="primary" isPending={isPending}>
              {submitLabel}
            </Button>
          </div>
        </form>
      )}
    </dialog>
  );
}
