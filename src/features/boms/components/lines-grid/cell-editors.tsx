import { useEffect, useRef, type RefObject } from 'react';
import { editorCommand } from '../../lines/grid-navigation';

export type CommitMove = 'down' | 'up' | 'right' | 'left' | 'stay';

export type EditorProps = {
  /** Accessible name of the editor: column and row ("Qty per unit, row 3"). */
  label: string;
  initial: string;
  /** A typed key that started the edit; it replaces the cell's text. */
  seed: string | null;
  errorId?: string;
  invalid?: boolean;
  /** Saves the text; false when it could not be read (the editor then stays open). */
  onCommit: (text: string, then: CommitMove) => boolean;
  onCancel: () => void;
  /**
   * Set by the editor to a function that commits what is typed: the grid calls it before
   * a click moves the active cell, so the edit is saved even if the editor is gone
   * before the browser reports the blur.
   */
  flushRef: RefObject<(() => void) | null>;
};

const editorClass =
  'h-full w-full min-w-0 border-2 border-slate-info bg-surface px-2 text-sm text-ink outline-none aria-[invalid=true]:border-brick';

/** Commits once, whichever comes first: a key, a click elsewhere, the blur. */
function useOnce(flushRef: EditorProps['flushRef'], read: () => string | null, onCommit: EditorProps['onCommit']) {
  const done = useRef(false);
  const commit = (text: string, then: CommitMove) => {
    if (done.current) return;
    done.current = onCommit(text, then);
  };
  const latest = useRef({ read, commit });
  useEffect(() => {
    latest.current = { read, commit };
  });
  useEffect(() => {
    flushRef.current = () => {
      const text = latest.current.read();
      if (text !== null) latest.current.commit(text, 'stay');
    };
    return () => {
      flushRef.current = null;
    };
  }, [flushRef]);
  return { done, commit };
}

/**
 * A text cell being edited. Enter commits and moves down, Tab right, Esc cancels;
 * leaving the cell (a click elsewhere) commits as well, as a spreadsheet does.
 */
export function TextEditor({ label, initial, seed, errorId, invalid, onCommit, onCancel, flushRef, numeric }: EditorProps & { numeric?: boolean }) {
  const ref = useRef<HTMLInputElement>(null);
  const { done, commit } = useOnce(flushRef, () => ref.current?.value ?? null, onCommit);

  useEffect(() => {
    const input = ref.current;
    if (!input) return;
    input.focus({ preventScroll: true });
    if (seed === null) input.select();
    else input.setSelectionRange(input.value.length, input.value.length);
  }, [seed]);

  return (
    <input
      ref={ref}
      aria-label={label}
      aria-invalid={invalid || undefined}
      aria-describedby={errorId}
      defaultValue={seed ?? initial}
      spellCheck={false}
      autoComplete="off"
      className={`${editorClass} ${numeric ? 'text-right tabular-nums' : ''}`}
      onKeyDown={(event) => {
        const command = editorCommand(event);
        if (!command) return;
        event.preventDefault();
        event.stopPropagation();
        if (command.type === 'cancel') {
          done.current = true;
          onCancel();
        } else {
          commit(event.currentTarget.value, command.then);
        }
      }}
      onBlur={(event) => commit(event.currentTarget.value, 'stay')}
    />
  );
}

/** A choice from a short list (the line kind, a quote); arrow keys choose, Enter or Tab commits. */
export function SelectEditor({
  label,
  initial,
  options,
  onCommit,
  onCancel,
  flushRef,
  disabled,
}: Omit<EditorProps, 'seed'> & { options: readonly { value: string; label: string }[]; disabled?: boolean }) {
  const ref = useRef<HTMLSelectElement>(null);
  const { done, commit } = useOnce(flushRef, () => ref.current?.value ?? null, onCommit);
  useEffect(() => ref.current?.focus({ preventScroll: true }), []);
  return (
    <select
      ref={ref}
      aria-label={label}
      defaultValue={initial}
      disabled={disabled}
      className={editorClass}
      onKeyDown={(event) => {
        const command = editorCommand(event);
        if (!command) return;
        event.preventDefault();
        event.stopPropagation();
        if (command.type === 'cancel') {
          done.current = true;
          onCancel();
        } else {
          commit(event.currentTarget.value, command.then);
        }
      }}
      onBlur={(event) => commit(event.currentTarget.value, 'stay')}
    >
      {options.map((option) => (
        <option key={option.value} value={option.value}>
          {option.label}
        </option>
      ))}
    </select>
  );
}
