import { useEffect, useId, useRef, type ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Icon } from './icon';

interface DialogProps {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** Buttons along the bottom; put the safe choice first. */
  footer?: ReactNode;
  /** Refuse Escape while a request runs, so a half-done change is not hidden. */
  busy?: boolean;
  size?: 'sm' | 'md';
}

/** A modal on the native <dialog>: the browser traps focus, makes the page inert and handles Escape. */
export function Dialog({ open, onClose, title, description, children, footer, busy, size = 'md' }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const opener = useRef<Element | null>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) {
      opener.current = document.activeElement;
      dialog.showModal();
      // React does not render the autofocus attribute, so the dialog picks its own first field.
      const first =
        dialog.querySelector<HTMLElement>('[data-autofocus]') ??
        dialog.querySelector<HTMLElement>('[data-dialog-body] :is(input, select, textarea, button):not([disabled])');
      first?.focus();
    } else if (!open && dialog.open) {
      dialog.close();
    }
  }, [open]);

  useEffect(() => {
    const dialog = ref.current;
    return () => {
      if (dialog?.open) dialog.close();
    };
  }, []);

  const handleClose = () => {
    if (opener.current instanceof HTMLElement) opener.current.focus();
    if (open) onClose();
  };

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onClose={handleClose}
      onCancel={(event) => {
        if (busy) event.preventDefault();
      }}
      className={cx(
        'm-auto max-h-[min(90dvh,48rem)] w-[calc(100%-1.5rem)] rounded-xl bg-surface-raised p-0 text-ink shadow-raised',
        'mb-3 sm:mb-auto',
        size === 'sm' ? 'max-w-md' : 'max-w-xl',
      )}
    >
      {open && (
        <div className="flex max-h-[inherit] flex-col">
          <div className="flex items-start justify-between gap-3 border-b border-line px-5 pt-4 pb-3">
            <div className="min-w-0">
              <h2 id={titleId} className="text-xl font-semibold">
                {title}
              </h2>
              {description && (
                <div id={descriptionId} className="mt-1 text-muted">
                  {description}
                </div>
              )}
            </div>
            <button
              type="button"
              onClick={onClose}
              disabled={busy}
              className="-mr-2 inline-flex min-h-touch min-w-touch items-center justify-center rounded-md text-muted hover:bg-surface-sunken disabled:opacity-50"
            >
              <Icon name="close" />
              <span className="sr-only">Close</span>
            </button>
          </div>
          <div data-dialog-body className="overflow-y-auto px-5 py-4">
            {children}
          </div>
          {footer && (
            <div className="flex flex-col-reverse gap-3 border-t border-line px-5 py-4 sm:flex-row sm:justify-end">
              {footer}
            </div>
          )}
        </div>
      )}
    </dialog>
  );
}
