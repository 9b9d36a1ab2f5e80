import { useEffect, useId, useRef, useState } from 'react';
import { formulaSteps } from '../words';

/**
 * How a check's numbers were got, on hover or on click. The button is reachable by
 * keyboard: Enter or Space pins the formula open, Escape or a click elsewhere closes it.
 */
export function FormulaPopover({ label, formula }: { label: string; formula: string }) {
  const [pinned, setPinned] = useState(false);
  const [hovered, setHovered] = useState(false);
  const open = pinned || hovered;
  const panelId = useId();
  const ref = useRef<HTMLSpanElement>(null);

  useEffect(() => {
    if (!pinned) return;
    const onPointerDown = (event: PointerEvent) => {
      if (!ref.current?.contains(event.target as Node)) setPinned(false);
    };
    document.addEventListener('pointerdown', onPointerDown);
    return () => document.removeEventListener('pointerdown', onPointerDown);
  }, [pinned]);

  return (
    <span
      ref={ref}
      className="relative inline-block"
      onMouseEnter={() => setHovered(true)}
      onMouseLeave={() => setHovered(false)}
      onKeyDown={(event) => {
        if (event.key === 'Escape' && open) {
          // Inside a dialog, Escape closes the formula first, not the dialog.
          event.stopPropagation();
          setPinned(false);
          setHovered(false);
        }
      }}
    >
      <button
        type="button"
        aria-expanded={open}
        aria-controls={open ? panelId : undefined}
        aria-label={`Formula: ${label}`}
        onClick={() => setPinned((p) => !p)}
        className={`rounded px-1.5 py-0.5 text-xs font-medium italic ${pinned ? 'bg-copper/10 text-copper-dark' : 'text-muted hover:bg-rule/50 hover:text-ink'}`}
      >
        ƒ(x)
      </button>
      {open ? (
        <span
          id={panelId}
          role="note"
          aria-label={`Formula: ${label}`}
          className="absolute top-full right-0 z-30 mt-1 block w-[26rem] max-w-[80vw] rounded-md border border-rule bg-surface p-3 text-left text-xs leading-relaxed text-ink shadow-lg"
        >
          <span className="mb-1 block font-semibold">{label}</span>
          <ol className="flex flex-col gap-0.5 tabular-nums">
            {formulaSteps(formula).map((step, i) => (
              <li key={i}>{step}</li>
            ))}
          </ol>
        </span>
      ) : null}
    </span>
  );
}
