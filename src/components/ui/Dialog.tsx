import clsx from 'clsx';
import { useEffect, useRef, type ReactNode } from 'react';

/** Props of {@link Dialog}. */
export interface DialogProps {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
  /** Buttons row at the bottom. */
  footer?: ReactNode;
  /** A wider dialog for two-column forms. */
  wide?: boolean;
}

/**
 * A modal dialog on the native `<dialog>` element: the browser traps focus, closes on Escape and
 * returns focus to the opener, which is more robust than a hand-rolled overlay.
 */
export function Dialog({ open, title, onClose, children, footer, wide }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby="dialog-title"
      onClose={onClose}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className={clsx(
        'm-auto rounded-md',
        wide ? 'w-[min(44rem,calc(100vw-2rem))]' : 'w-[min(32rem,calc(100vw-2rem))]',
        ' border border-sand-200 bg-white p-0 text-sand-900 shadow-dialog backdrop:bg-sand-900/40',
      )}
    >
      {open ? (
        <div className="flex flex-col gap-4 p-5">
          <h2 id="dialog-title" className="text-lg font-semibold">
            {title}
          </h2>
          <div className="text-base text-sand-700">{children}</div>
          {footer ? <div className="flex justify-end gap-2">{footer}</div> : null}
        </div>
      ) : null}
    </dialog>
  );
}
