import { useEffect, useId, useRef, type ReactNode } from 'react';

/**
 * A panel docked to the right edge over the page, for tools used beside a screen (the
 * circuit helpers of a BOM). A modal <dialog> like Dialog: the browser traps focus,
 * Escape closes, focus returns to what opened it. The content mounts only while open.
 */
export function SidePanel({ open, title, description, onClose, children }: { open: boolean; title: string; description?: ReactNode; onClose: () => void; children: ReactNode }) {
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
      className="m-0 ml-auto h-dvh max-h-dvh w-[min(46rem,100vw)] max-w-full overflow-y-auto border-l border-rule bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/20"
    >
      {open ? (
        <div className="flex min-h-full flex-col">
          <div className="sticky top-0 z-10 flex items-start justify-between gap-4 border-b border-rule bg-surface px-6 py-4">
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
          <div className="flex flex-col gap-5 px-6 py-5">{children}</div>
        </div>
      ) : null}
    </dialog>
  );
}
