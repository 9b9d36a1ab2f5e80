import { useEffect, useId, useLayoutEffect, useRef, useState, type CSSProperties } from 'react';
import { formulaSteps } from '../words';

const WIDTH = 416;
const GAP = 4;

/**
 * How a check's numbers were got, on hover or on click. The button is reachable by
 * keyboard: Enter or Space pins the formula open, Escape or a click elsewhere closes it.
 * The panel is placed against the viewport (fixed), so a scrolling table cannot clip
 * it; it opens upwards when there is no room below.
 */
export function FormulaPopover({ label, formula }: { label: string; formula: string }) {
  const [pinned, setPinned] = useState(false);
  const [hovered, setHovered] = useState(false);
  const [style, setStyle] = useState<CSSProperties>({ visibility: 'hidden' });
  const open = pinned || hovered;
  const panelId = useId();
  const ref = useRef<HTMLSpanElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const panelRef = useRef<HTMLSpanElement>(null);

  useLayoutEffect(() => {
    if (!open) return;
    const place = () => {
      const button = buttonRef.current?.getBoundingClientRect();
      const panel = panelRef.current?.getBoundingClientRect();
      if (!button || !panel) return;
      const width = Math.min(WIDTH, window.innerWidth - 16);
      const left = Math.max(8, Math.min(button.right - width, window.innerWidth - width - 8));
      const below = button.bottom + GAP;
      const top = below + panel.height > window.innerHeight - 8 && button.top - GAP - panel.height > 8 ? button.top - GAP - panel.height : below;
      setStyle({ position: 'fixed', top, left, width });
    };
    place();
    window.addEventListener('scroll', place, true);
    window.addEventListener('resize', place);
    return () => {
      window.removeEventListener('scroll', place, true);
      window.removeEventListener('resize', place);
    };
  }, [open]);

  useEffect(() => {
    if (!pinned) return;
    const onPointerDown = (event: PointerEvent) => {
      if (!ref.current?.contains(event.target as Node)) setPinned(false);
    };
    document.addEventListener('pointerdown', onPointerDown);
    return () => document.removeEventListener('pointerdown', onPointerDown);
  }, [pinned]);

  const close = () => {
    setPinned(false);
    setHovered(false);
    setStyle({ visibility: 'hidden' });
  };

  return (
    <span
      ref={ref}
      className="inline-block"
      onMouseEnter={() => setHovered(true)}
      onMouseLeave={() => {
        setHovered(false);
        if (!pinned) setStyle({ visibility: 'hidden' });
      }}
      onKeyDown={(event) => {
        if (event.key === 'Escape' && open) {
          // Inside a dialog, Escape closes the formula first, not the dialog.
          event.stopPropagation();
          event.preventDefault();
          close();
        }
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={open ? panelId : undefined}
        aria-label={`Formula: ${label}`}
        onClick={() => (pinned ? close() : setPinned(true))}
        className={`rounded px-1.5 py-0.5 text-xs font-medium italic ${pinned ? 'bg-copper/10 text-copper-dark' : 'text-muted hover:bg-rule/50 hover:text-ink'}`}
      >
        ƒ(x)
      </button>
      {open ? (
        <span
          ref={panelRef}
          id={panelId}
          role="note"
          aria-label={`Formula: ${label}`}
          style={style}
          className="fixed z-40 block w-[26rem] rounded-md border border-rule bg-surface p-3 text-left text-xs leading-relaxed font-normal text-ink normal-case shadow-lg"
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
