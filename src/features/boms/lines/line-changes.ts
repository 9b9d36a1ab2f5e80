import type { Line, LineDraft, LinePatch, OperatingPoint } from './line-types';

/**
 * One saved edit of the Lines grid, whatever its size: a cell typed, a block pasted, a
 * line added or removed, an undo. Single changes go out as PATCH/POST/DELETE, anything
 * bigger as one bulk request, so a paste is all-or-nothing on the server too.
 */
export type LineChange = {
  /** `tempId` names the optimistic row until the server answers; `restores` the id of a deleted line it brings back (undo). */
  create: { tempId: string; draft: LineDraft; restores?: string }[];
  update: { id: string; patch: LinePatch }[];
  delete: string[];
};

export type SavedLines = { created: Line[]; updated: Line[]; deleted: string[] };

export const emptyChange = (): LineChange => ({ create: [], update: [], delete: [] });

export function isEmptyChange(change: LineChange): boolean {
  return change.create.length === 0 && change.update.length === 0 && change.delete.length === 0;
}

export function isTempId(id: string): boolean {
  return id.startsWith('tmp-');
}

const blankOperatingPoint: OperatingPoint = { voltageV: null, currentA: null, powerW: null, ambientC: null };

/** A new line as the server would make it from a draft (its defaults), for the optimistic row. */
export function lineFromDraft(id: string, position: number, draft: LineDraft): Line {
  return {
    id,
    position: draft.position ?? position,
    kind: draft.kind ?? 'part',
    refDes: draft.refDes ?? '',
    partId: draft.partId ?? null,
    qtyPerUnit: draft.qtyPerUnit ?? '1',
    attritionPct: draft.attritionPct ?? null,
    pinnedQuoteId: draft.pinnedQuoteId ?? null,
    dnp: draft.dnp ?? false,
    note: draft.note ?? '',
    unitCost: draft.unitCost ?? null,
    oneTimeCost: draft.oneTimeCost ?? null,
    currency: draft.currency ?? null,
    operatingPoint: { ...blankOperatingPoint, ...draft.operatingPoint },
    unresolved: draft.unresolved ?? null,
    version: 0,
  };
}

/** A line with a patch laid over it, as the server applies it (choosing a part resolves an imported row). */
export function mergePatch(line: Line, patch: LinePatch): Line {
  const { operatingPoint, ...fields } = patch;
  const next: Line = { ...line, ...fields };
  if (operatingPoint) next.operatingPoint = { ...line.operatingPoint, ...operatingPoint };
  if (patch.partId) next.unresolved = null;
  return next;
}

/** True when the patch would change nothing on the line (no request is worth sending). */
export function isNoopPatch(line: Line, patch: LinePatch): boolean {
  for (const [key, value] of Object.entries(patch)) {
    if (key === 'operatingPoint') {
      for (const [opKey, opValue] of Object.entries(value as Partial<OperatingPoint>)) {
        if ((line.operatingPoint?.[opKey as keyof OperatingPoint] ?? null) !== (opValue ?? null)) return false;
      }
    } else if ((line[key as keyof Line] ?? null) !== (value ?? null)) {
      return false;
    }
  }
  return true;
}

function nextPosition(lines: readonly Line[]): number {
  return lines.reduce((max, line) => Math.max(max, line.position), -1) + 1;
}

const byPosition = (a: Line, b: Line) => a.position - b.position || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);

/** The lines as they will be once the change is saved: what the grid shows at once. */
export function applyChange(lines: readonly Line[], change: LineChange): Line[] {
  const patches = new Map(change.update.map((u) => [u.id, u.patch]));
  const deleted = new Set(change.delete);
  const out = lines.filter((line) => !deleted.has(line.id)).map((line) => (patches.has(line.id) ? mergePatch(line, patches.get(line.id)!) : line));
  let position = nextPosition(lines);
  for (const { tempId, draft } of change.create) out.push(lineFromDraft(tempId, position++, draft));
  return out.sort(byPosition);
}

/**
 * The server's answer laid over the lines: created rows replace their optimistic
 * stand-ins, updated rows take the new version and the server's reading of the fields
 * this change sent (a later edit still in flight keeps its own fields).
 */
export function applySaved(lines: readonly Line[], change: LineChange, saved: SavedLines): Line[] {
  const created = new Map(change.create.map((c, i) => [c.tempId, { fresh: saved.created[i], keys: Object.keys(c.draft) }]));
  const updated = new Map(saved.updated.map((line) => [line.id, line]));
  const sentKeys = new Map(change.update.map((u) => [u.id, Object.keys(u.patch)]));
  const deleted = new Set(saved.deleted);
  const out: Line[] = [];
  for (const line of lines) {
    if (deleted.has(line.id)) continue;
    const made = created.get(line.id);
    if (made?.fresh) {
      // The stand-in may have been edited since it was sent: keep those edits, take the id.
      const { id, bomId, version, position } = made.fresh;
      out.push(withServerFields({ ...line, id, bomId, version, position }, made.fresh, made.keys));
      continue;
    }
    const fresh = updated.get(line.id);
    if (!fresh) {
      out.push(line);
      continue;
    }
    out.push(withServerFields({ ...line, version: fresh.version, unresolved: fresh.unresolved }, fresh, sentKeys.get(line.id) ?? []));
  }
  return out.sort(byPosition);
}

function withServerFields(line: Line, fresh: Line, keys: readonly string[]): Line {
  const next = { ...line };
  for (const key of keys) {
    if (key === 'operatingPoint') next.operatingPoint = { ...fresh.operatingPoint };
    else (next as Record<string, unknown>)[key] = fresh[key as keyof Line];
  }
  return next;
}

/** The fields of `line` that `patch` would overwrite: sending them back undoes the patch. */
export function inversePatch(line: Line, patch: LinePatch): LinePatch {
  const inverse: LinePatch = {};
  const target = inverse as Record<string, unknown>;
  for (const key of Object.keys(patch)) {
    if (key === 'operatingPoint') {
      const op: Partial<OperatingPoint> = {};
      for (const opKey of Object.keys(patch.operatingPoint ?? {}) as (keyof OperatingPoint)[]) op[opKey] = line.operatingPoint?.[opKey] ?? null;
      inverse.operatingPoint = op;
    } else {
      target[key] = line[key as keyof Line];
    }
  }
  // Choosing a part clears the imported text and may drop a pin: bring both back.
  if ('partId' in patch) {
    inverse.unresolved = line.unresolved;
    inverse.pinnedQuoteId = line.pinnedQuoteId;
  }
  return inverse;
}

/** A saved line as a draft for creating it again (undo of a delete). */
export function draftOf(line: Line): LineDraft {
  const { id: _id, bomId: _bomId, version: _version, ...fields } = line;
  return fields;
}

let tempCounter = 0;
/** An id for an optimistic row; never a number, so it cannot meet a real id. */
export function newTempId(): string {
  tempCounter += 1;
  return `tmp-${Date.now().toString(36)}-${tempCounter}`;
}

/**
 * The change that takes a saved change back: updates get the old values, created lines
 * are deleted, deleted lines are created again (with new ids, remembered in `restores`).
 * `before` holds the lines as they were before the change.
 */
export function inverseChange(
  change: LineChange,
  before: ReadonlyMap<string, Line>,
  saved: SavedLines,
  resolve: (id: string) => string = (id) => id,
): LineChange {
  const inverse = emptyChange();
  for (const { id, patch } of change.update) {
    const line = before.get(id);
    if (line) inverse.update.push({ id: resolve(id), patch: inversePatch(line, patch) });
  }
  for (const line of saved.created) inverse.delete.push(line.id);
  for (const id of change.delete) {
    const line = before.get(id);
    if (line) inverse.create.push({ tempId: newTempId(), draft: draftOf(line), restores: resolve(id) });
  }
  return inverse;
}

/** Ids rewritten after an undo brought deleted lines back under new ids. */
export function remapChange(change: LineChange, ids: ReadonlyMap<string, string>): LineChange {
  if (ids.size === 0) return change;
  const map = (id: string) => ids.get(id) ?? id;
  return {
    create: change.create.map((c) => (c.restores && ids.has(c.restores) ? { ...c, restores: map(c.restores) } : c)),
    update: change.update.map((u) => ({ ...u, id: map(u.id) })),
    delete: change.delete.map(map),
  };
}
