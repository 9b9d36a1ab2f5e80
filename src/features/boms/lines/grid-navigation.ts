/**
 * Keyboard behaviour of the Lines grid as pure data: where the active cell is, whether
 * it is being edited, and how each key changes that. The grid component only renders
 * the state and performs the side effects a command names (save, toggle, clear, undo).
 */

export type GridState = {
  row: number;
  col: number;
  rowCount: number;
  colCount: number;
  editing: boolean;
  /** The key typed to start editing; it replaces the cell's text, as in a spreadsheet. */
  seed: string | null;
};

export type GridAction =
  | { type: 'move'; rows: number; cols: number }
  | { type: 'moveTo'; row: number; col: number }
  | { type: 'edit'; seed?: string | null }
  | { type: 'cancel' }
  | { type: 'commit'; then: 'down' | 'up' | 'right' | 'left' | 'stay' }
  | { type: 'resize'; rowCount: number; colCount: number };

/** What a key means: a state change, or a side effect for the grid to carry out. */
export type GridCommand = GridAction | { type: 'toggle' } | { type: 'clear' } | { type: 'undo' } | { type: 'copy' };

export type KeyLike = { key: string; shiftKey?: boolean; ctrlKey?: boolean; metaKey?: boolean; altKey?: boolean };

export function initialGridState(rowCount: number, colCount: number): GridState {
  return { row: 0, col: 0, rowCount, colCount, editing: false, seed: null };
}

const clamp = (n: number, max: number) => Math.max(0, Math.min(n, Math.max(0, max - 1)));

/** One step right or left in reading order: past the last column is the next row's first. */
function step(state: GridState, forward: boolean): { row: number; col: number } {
  const { row, col, colCount, rowCount } = state;
  if (forward) {
    if (col < colCount - 1) return { row, col: col + 1 };
    return row < rowCount - 1 ? { row: row + 1, col: 0 } : { row, col };
  }
  if (col > 0) return { row, col: col - 1 };
  return row > 0 ? { row: row - 1, col: colCount - 1 } : { row, col };
}

export function gridReducer(state: GridState, action: GridAction): GridState {
  switch (action.type) {
    case 'move':
      return {
        ...state,
        row: clamp(state.row + action.rows, state.rowCount),
        col: clamp(state.col + action.cols, state.colCount),
        editing: false,
        seed: null,
      };
    case 'moveTo':
      return { ...state, row: clamp(action.row, state.rowCount), col: clamp(action.col, state.colCount), editing: false, seed: null };
    case 'edit':
      if (state.rowCount === 0 || state.colCount === 0) return state;
      return { ...state, editing: true, seed: action.seed ?? null };
    case 'cancel':
      return { ...state, editing: false, seed: null };
    case 'commit': {
      const base = { ...state, editing: false, seed: null };
      switch (action.then) {
        case 'down':
          return { ...base, row: clamp(state.row + 1, state.rowCount) };
        case 'up':
          return { ...base, row: clamp(state.row - 1, state.rowCount) };
        case 'right':
          return { ...base, ...step(state, true) };
        case 'left':
          return { ...base, ...step(state, false) };
        default:
          return base;
      }
    }
    case 'resize': {
      const rowCount = Math.max(0, action.rowCount);
      const colCount = Math.max(0, action.colCount);
      const row = clamp(state.row, rowCount);
      const col = clamp(state.col, colCount);
      // A row that vanished under an edit (someone deleted it) ends the edit.
      const editing = state.editing && rowCount > 0 && row === state.row && col === state.col;
      return { ...state, rowCount, colCount, row, col, editing, seed: editing ? state.seed : null };
    }
  }
}

/** A key that types a character (not a shortcut, not a named key such as "ArrowUp"). */
export function isPrintable(event: KeyLike): boolean {
  return event.key.length === 1 && !event.ctrlKey && !event.metaKey && !event.altKey;
}

/**
 * A key pressed on the grid while no cell is being edited. Returns null for keys the
 * grid leaves to the browser, such as Tab on the very first or last cell (so keyboard
 * users can leave the grid) and shortcuts it does not use.
 */
export function navigationCommand(event: KeyLike, state: GridState, options: { pageRows: number; toggles: boolean }): GridCommand | null {
  const mod = event.ctrlKey || event.metaKey;
  switch (event.key) {
    case 'ArrowUp':
      return mod ? { type: 'moveTo', row: 0, col: state.col } : { type: 'move', rows: -1, cols: 0 };
    case 'ArrowDown':
      return mod ? { type: 'moveTo', row: state.rowCount - 1, col: state.col } : { type: 'move', rows: 1, cols: 0 };
    case 'ArrowLeft':
      return mod ? { type: 'moveTo', row: state.row, col: 0 } : { type: 'move', rows: 0, cols: -1 };
    case 'ArrowRight':
      return mod ? { type: 'moveTo', row: state.row, col: state.colCount - 1 } : { type: 'move', rows: 0, cols: 1 };
    case 'Home':
      return mod ? { type: 'moveTo', row: 0, col: 0 } : { type: 'moveTo', row: state.row, col: 0 };
    case 'End':
      return mod ? { type: 'moveTo', row: state.rowCount - 1, col: state.colCount - 1 } : { type: 'moveTo', row: state.row, col: state.colCount - 1 };
    case 'PageDown':
      return { type: 'move', rows: options.pageRows, cols: 0 };
    case 'PageUp':
      return { type: 'move', rows: -options.pageRows, cols: 0 };
    case 'Tab': {
      const atStart = state.row === 0 && state.col === 0;
      const atEnd = state.row >= state.rowCount - 1 && state.col >= state.colCount - 1;
      if (event.shiftKey ? atStart : atEnd) return null;
      return { type: 'commit', then: event.shiftKey ? 'left' : 'right' };
    }
    case 'Enter':
    case 'F2':
      return options.toggles ? { type: 'toggle' } : { type: 'edit', seed: null };
    case ' ':
      return options.toggles ? { type: 'toggle' } : { type: 'edit', seed: ' ' };
    case 'Delete':
    case 'Backspace':
      return { type: 'clear' };
    default:
      break;
  }
  if (mod && !event.altKey && event.key.toLowerCase() === 'z' && !event.shiftKey) return { type: 'undo' };
  if (mod && !event.altKey && event.key.toLowerCase() === 'c') return { type: 'copy' };
  if (isPrintable(event)) return options.toggles ? null : { type: 'edit', seed: event.key };
  return null;
}

/** A key pressed inside a cell's editor: Enter commits and moves down, Tab right, Esc cancels. */
export function editorCommand(event: KeyLike): Extract<GridAction, { type: 'commit' | 'cancel' }> | null {
  switch (event.key) {
    case 'Enter':
      return { type: 'commit', then: event.shiftKey ? 'up' : 'down' };
    case 'Tab':
      return { type: 'commit', then: event.shiftKey ? 'left' : 'right' };
    case 'Escape':
      return { type: 'cancel' };
    default:
      return null;
  }
}
