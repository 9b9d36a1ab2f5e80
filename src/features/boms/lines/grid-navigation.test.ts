import { describe, expect, it } from 'vitest';
import { editorCommand, gridReducer, initialGridState, navigationCommand, type GridCommand, type GridState } from './grid-navigation';

const at = (row: number, col: number, over: Partial<GridState> = {}): GridState => ({ ...initialGridState(10, 5), row, col, ...over });
/** Applies a key's command, which must be a move or an edit rather than a side effect. */
function press(state: GridState, command: GridCommand | null): GridState {
  if (!command || command.type === 'toggle' || command.type === 'clear' || command.type === 'undo' || command.type === 'copy') {
    throw new Error(`not a state change: ${JSON.stringify(command)}`);
  }
  return gridReducer(state, command);
}
const nav = (key: string, state: GridState, extra: Partial<KeyboardEvent> = {}, toggles = false) =>
  navigationCommand({ key, ...extra }, state, { pageRows: 4, toggles });

describe('moving the active cell', () => {
  it('arrows move one cell and stop at the edges', () => {
    expect(gridReducer(at(0, 0), { type: 'move', rows: 1, cols: 0 })).toMatchObject({ row: 1, col: 0 });
    expect(gridReducer(at(0, 0), { type: 'move', rows: -1, cols: -1 })).toMatchObject({ row: 0, col: 0 });
    expect(gridReducer(at(9, 4), { type: 'move', rows: 1, cols: 1 })).toMatchObject({ row: 9, col: 4 });
  });

  it('page keys move by a page, ctrl+arrows jump to the ends', () => {
    expect(press(at(2, 1), nav('PageDown', at(2, 1)))).toMatchObject({ row: 6 });
    expect(nav('ArrowDown', at(2, 1), { ctrlKey: true })).toEqual({ type: 'moveTo', row: 9, col: 1 });
    expect(nav('Home', at(2, 3))).toEqual({ type: 'moveTo', row: 2, col: 0 });
    expect(nav('End', at(2, 3), { ctrlKey: true })).toEqual({ type: 'moveTo', row: 9, col: 4 });
  });

  it('Tab moves right, wrapping to the next row; Shift+Tab left', () => {
    expect(press(at(3, 2), nav('Tab', at(3, 2)))).toMatchObject({ row: 3, col: 3 });
    expect(press(at(3, 4), nav('Tab', at(3, 4)))).toMatchObject({ row: 4, col: 0 });
    expect(press(at(4, 0), nav('Tab', at(4, 0), { shiftKey: true }))).toMatchObject({ row: 3, col: 4 });
  });

  it('lets Tab leave the grid from its first and last cell', () => {
    expect(nav('Tab', at(9, 4))).toBeNull();
    expect(nav('Tab', at(0, 0), { shiftKey: true })).toBeNull();
  });
});

describe('editing a cell', () => {
  it('Enter or F2 starts editing with the cell text; typing starts with the typed key', () => {
    expect(nav('Enter', at(1, 1))).toEqual({ type: 'edit', seed: null });
    expect(nav('F2', at(1, 1))).toEqual({ type: 'edit', seed: null });
    expect(nav('7', at(1, 1))).toEqual({ type: 'edit', seed: '7' });
    expect(gridReducer(at(1, 1), { type: 'edit', seed: '7' })).toMatchObject({ editing: true, seed: '7' });
  });

  it('shortcuts are not typing', () => {
    expect(nav('z', at(1, 1), { ctrlKey: true })).toEqual({ type: 'undo' });
    expect(nav('z', at(1, 1), { metaKey: true })).toEqual({ type: 'undo' });
    expect(nav('c', at(1, 1), { ctrlKey: true })).toEqual({ type: 'copy' });
    expect(nav('v', at(1, 1), { ctrlKey: true })).toBeNull();
    expect(nav('Shift', at(1, 1))).toBeNull();
  });

  it('a yes/no cell toggles on Enter and Space instead of opening an editor', () => {
    expect(nav('Enter', at(1, 1), {}, true)).toEqual({ type: 'toggle' });
    expect(nav(' ', at(1, 1), {}, true)).toEqual({ type: 'toggle' });
    expect(nav('x', at(1, 1), {}, true)).toBeNull();
  });

  it('Enter commits and moves down, Tab commits and moves right, Esc cancels in place', () => {
    const editing = at(2, 2, { editing: true, seed: 'x' });
    expect(gridReducer(editing, editorCommand({ key: 'Enter' })!)).toMatchObject({ row: 3, col: 2, editing: false, seed: null });
    expect(gridReducer(editing, editorCommand({ key: 'Tab' })!)).toMatchObject({ row: 2, col: 3, editing: false });
    expect(gridReducer(editing, editorCommand({ key: 'Tab', shiftKey: true })!)).toMatchObject({ row: 2, col: 1 });
    expect(gridReducer(editing, editorCommand({ key: 'Escape' })!)).toMatchObject({ row: 2, col: 2, editing: false });
    expect(editorCommand({ key: 'a' })).toBeNull();
  });

  it('Enter on the last row commits and stays there', () => {
    expect(gridReducer(at(9, 2, { editing: true }), { type: 'commit', then: 'down' })).toMatchObject({ row: 9, editing: false });
  });

  it('Delete clears the cell', () => {
    expect(nav('Delete', at(1, 1))).toEqual({ type: 'clear' });
    expect(nav('Backspace', at(1, 1))).toEqual({ type: 'clear' });
  });
});

describe('when the lines change under the grid', () => {
  it('keeps the active cell inside the grid and ends an edit whose row is gone', () => {
    const editing = at(9, 4, { editing: true });
    expect(gridReducer(editing, { type: 'resize', rowCount: 5, colCount: 5 })).toMatchObject({ row: 4, col: 4, editing: false });
    expect(gridReducer(at(3, 4, { editing: true }), { type: 'resize', rowCount: 12, colCount: 5 })).toMatchObject({ row: 3, editing: true });
    expect(gridReducer(at(3, 4), { type: 'resize', rowCount: 0, colCount: 5 })).toMatchObject({ row: 0, col: 4 });
  });

  it('an empty grid never starts editing', () => {
    expect(gridReducer(initialGridState(0, 5), { type: 'edit' }).editing).toBe(false);
  });
});
