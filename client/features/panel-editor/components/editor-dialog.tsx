import { useId, type ReactNode } from 'react';
import { useModal } from '../../../components/ui/use-modal';
import { cx } from '../../../lib/cx';

type EditorDialogProps = {
  isOpen: boolean;
  title: string;
  description?: ReactNode;
  onClose: () => void;
  /** False while a request runs, so Escape does not leave it half done. */
  canClose?: boolean;
  width?: 'md' | 'lg' | 'xl';
  children: ReactNode;
  footer?: ReactNode;
};

const WIDTHS = { md: 'w-[min(34rem,calc(100vw-2rem))]', lg: 'w-[min(48rem,calc(100vw-2rem))]', xl: 'w-[min(64rem,calc(100vw-2rem))]' };

/** A modal of the designer (conflict, versions, contract). Escape closes it unless `canClose` is false. */
export function EditorDialog({ isOpen, title, description, onClose, canClose = true, width = 'md', children, footer }: EditorDialogProps) {
  const ref = useModal(isOpen);
  const titleId = useId();
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        if (canClose) onClose();
      }}
      className={cx('m-auto max-h-[calc(100dvh-2rem)] rounded-xl bg-asphalt-850 p-0 text-asphalt-100 shadow-2xl ring-1 ring-asphalt-600', WIDTHS[width])}
    >
      {isOpen && (
        <div className="flex max-h-[calc(100dvh-2rem)] flex-col">
          <div className="flex items-start justify-between gap-4 border-b border-asphalt-750 px-5 pt-5 pb-4">
            <div className="min-w-0">
              <h2 id={titleId} className="text-lg font-semibold">
                {title}
              </h2>
              {description && <div className="mt-1 text-[0.9375rem] text-asphalt-400">{description}</div>}
            </div>
            {canClose && (
              <button type="button" aria-label="Close" onClick={onClose} className="grid size-11 shrink-0 place-items-center rounded-lg text-asphalt-300 hover:bg-asphalt-750 hover:text-asphalt-100">
                <svg viewBox="0 0 16 16" aria-hidden="true" className="size-4" fill="none" stroke="currentColor" strokeWidth="1.75" strokeLinecap="round">
                  <path d="M4 4l8 8M12 4l-8 8" />
                </svg>
              </button>
            )}
          </div>
          <div className="min-h-0 flex-1 overflow-y-auto px-5 py-4">{children}</div>
          {footer && <div className="flex flex-wrap justify-end gap-2 border-t border-asphalt-750 px-5 py-4">{footer}</div>}
        </div>
      )}
    </dialog>
  );
}
