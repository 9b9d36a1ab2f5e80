import { describe, expect, it } from 'vitest';
import { applyChange, applySaved, emptyChange, inverseChange, isNoopPatch, lineFromDraft, mergePatch, type LineChange } from './line-changes';
import { popUndo, pruneUndo, pushUndo, remapUndo, type UndoStack } from './undo-stack';
import type { Line } from './line-types';

const r1 = { ...lineFromDraft('1', 0, { refDes: 'R1', qtyPerUnit: '1', partId: '11' }), version: 3 };
const c1 = { ...lineFromDraft('2', 1, { refDes: 'C1', qtyPerUnit: '1', unresolved: 'HV cap 2n2 2kV' }), version: 1 };
const lines: Line[] = [r1, c1];
const byId = new Map(lines.map((l) => [l.id, l]));
const change = (over: Partial<LineChange>): LineChange => ({ ...emptyChange(), ...over });

describe('optimistic lines', () => {
  it('lays a patch over a line; choosing a part resolves an imported row', () => {
    expect(mergePatch(c1, { partId: '12' })).toMatchObject({ partId: '12', unresolved: null });
    expect(mergePatch(r1, { operatingPoint: { voltageV: 1900 } }).operatingPoint).toEqual({ voltageV: 1900, currentA: null, powerW: null, ambientC: null });
  });

  it('knows when an edit changes nothing', () => {
    expect(isNoopPatch(r1, { refDes: 'R1' })).toBe(true);
    expect(isNoopPatch(r1, { refDes: 'R2' })).toBe(false);
    expect(isNoopPatch(r1, { operatingPoint: { voltageV: null } })).toBe(true);
  });

  it('shows a change at once and then takes the saved versions', () => {
    const edit = change({ update: [{ id: '1', patch: { qtyPerUnit: '2' } }], create: [{ tempId: 'tmp-a', draft: { refDes: 'R2' } }] });
    const shown = applyChange(lines, edit);
    expect(shown.map((l) => l.id)).toEqual(['1', '2', 'tmp-a']);
    expect(shown[0].qtyPerUnit).toBe('2');
    expect(shown[2]).toMatchObject({ position: 2, kind: 'part', qtyPerUnit: '1' });

    const saved = applySaved(shown, edit, {
      created: [{ ...lineFromDraft('9', 2, { refDes: 'R2' }), version: 1 }],
      updated: [{ ...r1, qtyPerUnit: '2', version: 4 }],
      deleted: [],
    });
    expect(saved.map((l) => [l.id, l.version])).toEqual([['1', 4], ['2', 1], ['9', 1]]);
  });

  it('keeps a later edit in flight when an earlier save answers', () => {
    // qty saved, then a refDes edit is still on its way: the answer must not undo it on screen.
    const shown = applyChange(lines, change({ update: [{ id: '1', patch: { refDes: 'R1 R5' } }] }));
    const saved = applySaved(shown, change({ update: [{ id: '1', patch: { qtyPerUnit: '2' } }] }), {
      created: [],
      updated: [{ ...r1, qtyPerUnit: '2', version: 4 }],
      deleted: [],
    });
    expect(saved[0]).toMatchObject({ refDes: 'R1 R5', qtyPerUnit: '2', version: 4 });
  });
});

describe('undo', () => {
  it('reverts an edit with the old values, including the imported text a part choice cleared', () => {
    const edit = change({ update: [{ id: '2', patch: { partId: '12' } }] });
    const inverse = inverseChange(edit, byId, { created: [], updated: [], deleted: [] });
    expect(inverse.update).toEqual([{ id: '2', patch: { partId: null, unresolved: 'HV cap 2n2 2kV', pinnedQuoteId: null } }]);
  });

  it('reverts an operating-point edit field by field', () => {
    const inverse = inverseChange(change({ update: [{ id: '1', patch: { operatingPoint: { currentA: 0.7 } } }] }), byId, { created: [], updated: [], deleted: [] });
    expect(inverse.update[0].patch).toEqual({ operatingPoint: { currentA: null } });
  });

  it('deletes what was added and brings back what was deleted', () => {
    const inverse = inverseChange(change({ create: [{ tempId: 'tmp-1', draft: {} }], delete: ['2'] }), byId, {
      created: [{ ...lineFromDraft('7', 2, {}), version: 1 }],
      updated: [],
      deleted: ['2'],
    });
    expect(inverse.delete).toEqual(['7']);
    expect(inverse.create).toHaveLength(1);
    expect(inverse.create[0]).toMatchObject({ restores: '2', draft: { refDes: 'C1', position: 1, unresolved: 'HV cap 2n2 2kV' } });
    expect(inverse.create[0].draft).not.toHaveProperty('id');
    expect(inverse.create[0].draft).not.toHaveProperty('version');
  });

  it('names lines by their real ids once an optimistic row has been saved', () => {
    const inverse = inverseChange(change({ update: [{ id: 'tmp-x', patch: { refDes: 'R8' } }] }), new Map([['tmp-x', { ...r1, id: 'tmp-x' }]]), { created: [], updated: [], deleted: [] }, (id) => (id === 'tmp-x' ? '41' : id));
    expect(inverse.update[0].id).toBe('41');
  });

  it('is last in, first out, and forgets the oldest steps past its limit', () => {
    let stack: UndoStack = [];
    for (let i = 1; i <= 5; i++) stack = pushUndo(stack, { label: `edit ${i}`, change: emptyChange() }, 3);
    expect(stack.map((e) => e.label)).toEqual(['edit 3', 'edit 4', 'edit 5']);
    const popped = popUndo(stack)!;
    expect(popped.entry.label).toBe('edit 5');
    expect(popped.rest.map((e) => e.label)).toEqual(['edit 3', 'edit 4']);
    expect(popUndo([])).toBeNull();
  });

  it('follows a line brought back under a new id', () => {
    const stack = pushUndo([], { label: 'qty', change: change({ update: [{ id: '2', patch: { qtyPerUnit: '1' } }], delete: ['2'] }) });
    const remapped = remapUndo(stack, new Map([['2', '8']]));
    expect(remapped[0].change.update[0].id).toBe('8');
    expect(remapped[0].change.delete).toEqual(['8']);
  });

  it('drops steps for lines that are gone', () => {
    const stack = pushUndo(pushUndo([], { label: 'a', change: change({ update: [{ id: '1', patch: {} }] }) }), { label: 'b', change: change({ update: [{ id: '5', patch: {} }] }) });
    expect(pruneUndo(stack, new Set(['1', '2'])).map((e) => e.label)).toEqual(['a']);
  });
});
