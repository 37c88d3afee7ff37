// One modal dialog, on the native <dialog> element: focus is kept inside, Esc closes it, and the
// page behind is inert. Open and close it through the `open` prop.
import { useEffect, useId, useRef, type ReactNode } from 'react';

export type DialogProps = {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** Buttons at the bottom right. */
  footer?: ReactNode;
  width?: 'sm' | 'md' | 'lg';
};

const widths = { sm: 'w-[26rem]', md: 'w-[34rem]', lg: 'w-[52rem]' } as const;

export function Dialog({ open, onClose, title, description, children, footer, width = 'md' }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={onClose}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className={`m-auto max-h-[88vh] max-w-[94vw] rounded-md border border-line bg-surface p-0 text-ink shadow-xl ${widths[width]}`}
    >
      {open && (
        <div className="flex max-h-[88vh] flex-col">
          <div className="flex items-start justify-between gap-4 border-b border-line px-5 py-3">
            <div>
              <h2 id={titleId} className="text-lg">
                {title}
              </h2>
              {description && <div className="mt-0.5 text-ink-muted">{description}</div>}
            </div>
            <button
              type="button"
              onClick={onClose}
              aria-label="Close"
              className="-mr-2 rounded px-2 text-xl leading-7 text-ink-muted hover:bg-canvas"
            >
              ×
            </button>
          </div>
          <div className="overflow-auto px-5 py-4">{children}</div>
          {footer && <div className="flex flex-wrap justify-end gap-2 border-t border-line px-5 py-3">{footer}</div>}
        </div>
      )}
    </dialog>
  );
}
