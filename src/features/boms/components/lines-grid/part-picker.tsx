import { useEffect, useId, useLayoutEffect, useRef, useState } from 'react';
import { createPortal } from 'react-dom';
import { useQuery } from '@tanstack/react-query';
import { useDebouncedValue } from '../../../../lib/use-debounced-value';
import { partLabel, partSearchQueryOptions, type PartSummary } from '../../api';
import { editorCommand } from '../../lines/grid-navigation';
import type { CommitMove } from './cell-editors';

/**
 * The part cell being edited: a search in the trade's words (an MPN, an internal PN, a
 * value and package such as "22M 1206") with the matches below. Arrow keys choose,
 * Enter or Tab picks, Esc leaves the line as it was. Picking a part resolves an
 * unresolved imported line.
 */
export function PartPicker({
  label,
  initial,
  seed,
  onPick,
  onCancel,
}: {
  label: string;
  initial: string;
  seed: string | null;
  onPick: (part: PartSummary | null, then: CommitMove) => void;
  onCancel: () => void;
}) {
  const inputRef = useRef<HTMLInputElement>(null);
  const [text, setText] = useState(seed ?? initial);
  const [highlight, setHighlight] = useState(0);
  const [box, setBox] = useState<{ left: number; top: number; width: number } | null>(null);
  const listId = useId();
  const query = useDebouncedValue(text.trim(), 150);
  const search = useQuery({ ...partSearchQueryOptions(query), enabled: query.length > 0 });
  const matches = query.length > 0 ? (search.data ?? []) : [];
  const active = matches[Math.min(highlight, matches.length - 1)];

  useEffect(() => {
    const input = inputRef.current;
    if (!input) return;
    input.focus({ preventScroll: true });
    if (seed === null) input.select();
  }, [seed]);

  // The list is drawn over the page (a portal), so the grid's scrolling box cannot clip it.
  useLayoutEffect(() => {
    const place = () => {
      const rect = inputRef.current?.getBoundingClientRect();
      if (rect) setBox({ left: rect.left, top: rect.bottom + 2, width: Math.max(rect.width, 420) });
    };
    place();
    window.addEventListener('scroll', place, true);
    window.addEventListener('resize', place);
    return () => {
      window.removeEventListener('scroll', place, true);
      window.removeEventListener('resize', place);
    };
  }, []);

  const pick = (then: CommitMove) => {
    if (text.trim() === '') onPick(null, then);
    else if (active) onPick(active, then);
  };

  return (
    <>
      <input
        ref={inputRef}
        role="combobox"
        aria-label={label}
        aria-expanded={matches.length > 0}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={active ? `${listId}-${active.id}` : undefined}
        value={text}
        spellCheck={false}
        autoComplete="off"
        placeholder="MPN, internal PN or value and package"
        className="h-full w-full min-w-0 border-2 border-slate-info bg-surface px-2 text-sm text-ink outline-none"
        onChange={(event) => {
          setText(event.target.value);
          setHighlight(0);
        }}
        onKeyDown={(event) => {
          if (event.key === 'ArrowDown' || event.key === 'ArrowUp') {
            event.preventDefault();
            event.stopPropagation();
            const delta = event.key === 'ArrowDown' ? 1 : -1;
            setHighlight((h) => Math.max(0, Math.min(matches.length - 1, h + delta)));
            return;
          }
          const command = editorCommand(event);
          if (!command) return;
          event.preventDefault();
          event.stopPropagation();
          if (command.type === 'cancel') onCancel();
          else pick(command.then);
        }}
        onBlur={() => onCancel()}
      />
      {box
        ? createPortal(
            <div
              className="fixed z-50 max-h-72 overflow-auto rounded-md border border-rule bg-surface text-sm shadow-lg"
              style={{ left: box.left, top: box.top, width: box.width }}
              // Scrolling the list with the mouse must not take focus from the search box.
              onMouseDown={(event) => event.preventDefault()}
            >
              <ul id={listId} role="listbox" aria-label={`Parts matching ${query || 'the search'}`}>
                {matches.map((part, index) => (
                  <li
                    key={part.id}
                    id={`${listId}-${part.id}`}
                    role="option"
                    aria-selected={part === active}
                    // mousedown, not click: the input must not lose focus (and cancel) first.
                    onMouseDown={(event) => {
                      event.preventDefault();
                      event.stopPropagation();
                      onPick(part, 'stay');
                    }}
                    onMouseEnter={() => setHighlight(index)}
                    className={`cursor-pointer px-3 py-1.5 ${part === active ? 'bg-copper/10' : ''}`}
                  >
                    <span className="font-medium">{partLabel(part)}</span>
                    <span className="block truncate text-xs text-muted">{[part.description, part.package, part.category].filter(Boolean).join(' · ')}</span>
                  </li>
                ))}
              </ul>
              <p className="border-t border-rule px-3 py-1.5 text-xs text-muted" role="status">
                {query.length === 0
                  ? 'Type to search the parts library. An empty box removes the part.'
                  : search.isFetching && matches.length === 0
                    ? 'Searching…'
                    : search.isError
                      ? 'The search failed; try again.'
                      : matches.length === 0
                        ? `No part matches “${query}”.`
                        : `${matches.length} match${matches.length === 1 ? '' : 'es'}; Enter picks the highlighted one.`}
              </p>
            </div>,
            document.body,
          )
        : null}
    </>
  );
}
