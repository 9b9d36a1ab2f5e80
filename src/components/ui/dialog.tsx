import { useEffect, useId, useRef, type ReactNode } from 'react';

const widths = { md: 'max-w-xl', lg: 'max-w-3xl', xl: 'max-w-6xl' } as const;

/**
 * A modal panel for a form (a new part, a quote, an import). Built on <dialog> like
 * ConfirmDialog: the browser traps focus, Escape closes, focus returns to the opener.
 * The content mounts only while open, so a form starts fresh each time.
 */
export function Dialog({
  open,
  title,
  description,
  onClose,
  size = 'md',
  children,
}: {
  open: boolean;
  title: string;
  description?: ReactNode;
  onClose: () => void;
  size?: keyof typeof widths;
  children: ReactNode;
}) {
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
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className={`m-auto max-h-[92vh] w-[calc(100%-2rem)] overflow-y-auto ${widths[size]} rounded-lg border border-rule bg-surface p-0 text-ink shadow-xl backdrop:bg-ink/30`}
    >
      {open ? (
        <div className="flex flex-col gap-4 p-6">
          <div className="flex items-start justify-between gap-4">
            <div>
              <h2 id={titleId} className="text-lg font-semibold">
                {title}
              </h2>
              {description ? <p className="mt-1 max-w-prose text-sm text-muted">{description}</p> : null}
            </div>
            <button
              type="button"
              onClick={onClose}
              aria-label="Close"
              className="-mt-1 -mr-2 rounded-md px-2 py-1 text-lg leading-none text-muted hover:bg-rule/50 hover:text-ink"
            >
              <span aria-hidden="true">×</span>
            </button>
          </div>
          {children}
        </div>
      ) : null}
    </dialog>
  );
}
