import { useEffect, useRef } from 'react';
import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { uploadFile, type UploadProgress } from '../../lib/upload';
import type { BomCreateBody, BomState } from '../../shared/schemas/boms';
import { bomKeys, type Bom, type BomDetail, type ImportPreview, type Shelf, type Snapshot } from './api';
import { applyChange, applySaved, isTempId, type LineChange, type SavedLines } from './lines/line-changes';
import type { Line, LineDraft, LinePatch } from './lines/line-types';

const enc = encodeURIComponent;

/**
 * Everything a change to a BOM's lines makes stale besides the lines themselves: the
 * cost roll (and so the running total), the volume curve, the shelf-price ladder, the
 * stress check and the BOM list's roll-up. Not awaited by line saves: the next save in
 * the queue must not wait for a cost roll to be recomputed.
 */
function invalidateDerived(queryClient: QueryClient, bomId: string) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: bomKeys.costs(bomId) }),
    queryClient.invalidateQueries({ queryKey: bomKeys.curves(bomId) }),
    queryClient.invalidateQueries({ queryKey: bomKeys.ladders(bomId) }),
    queryClient.invalidateQueries({ queryKey: bomKeys.stress(bomId) }),
    queryClient.invalidateQueries({ queryKey: bomKeys.compares() }),
    queryClient.invalidateQueries({ queryKey: bomKeys.lists() }),
  ]);
}

export function useCreateBom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: BomCreateBody) => api.post<Bom>('/api/boms', body),
    // The plan's BOM count changes too.
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: bomKeys.lists() }), queryClient.invalidateQueries({ queryKey: ['billing'] })]),
  });
}

type BomPatch = Partial<Pick<Bom, 'name' | 'reportingCurrency' | 'profileId' | 'plannedQty' | 'targetUnitCost' | 'amortisationQty' | 'notes'>> & {
  shelf?: Shelf;
  version: number;
};

/** Changes a BOM's details or its shelf inputs; every figure derived from them is refreshed. */
export function useUpdateBom(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: BomPatch) => api.patch<Bom>(`/api/boms/${enc(bomId)}`, body),
    onSuccess: async (bom) => {
      queryClient.setQueryData<BomDetail>(bomKeys.detail(bomId), (old) => (old ? { ...old, ...bom } : old));
      await Promise.all([queryClient.invalidateQueries({ queryKey: bomKeys.detail(bomId), exact: true }), invalidateDerived(queryClient, bomId)]);
    },
    onError: () => queryClient.invalidateQueries({ queryKey: bomKeys.detail(bomId), exact: true }),
  });
}

export function useDeleteBom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (bomId: string) => api.delete(`/api/boms/${enc(bomId)}`),
    onSuccess: async (_data, bomId) => {
      queryClient.removeQueries({ queryKey: bomKeys.detail(bomId) });
      await queryClient.invalidateQueries({ queryKey: bomKeys.lists() });
    },
  });
}

/** Draft → In review → Released (and back to draft from review). */
export function useChangeBomState(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ state, version }: { state: BomState; version: number }) => api.post<Bom>(`/api/boms/${enc(bomId)}/state`, { state, version }),
    onSuccess: async (bom) => {
      queryClient.setQueryData<BomDetail>(bomKeys.detail(bomId), (old) => (old ? { ...old, ...bom } : old));
      // The family's revision list carries states too, on every revision's page.
      await Promise.all([queryClient.invalidateQueries({ queryKey: bomKeys.details() }), queryClient.invalidateQueries({ queryKey: bomKeys.lists() })]);
    },
    onError: () => queryClient.invalidateQueries({ queryKey: bomKeys.detail(bomId), exact: true }),
  });
}

/** The next revision: a draft copy of this one and its lines. */
export function useNewRevision(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<Bom>(`/api/boms/${enc(bomId)}/revisions`),
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: bomKeys.details() }), queryClient.invalidateQueries({ queryKey: bomKeys.lists() })]),
  });
}

export function useSaveSnapshot(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name: string; qty?: number; date?: string }) => api.post<Snapshot>(`/api/boms/${enc(bomId)}/snapshots`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bomKeys.snapshots(bomId) }),
  });
}

/**
 * Sends a file to the import: a preview by default, every row in one transaction with
 * `commit`. A commit adds lines, so the lines and all they feed are read again.
 */
export function useImportLines(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, mapping, commit, onProgress }: { file: File; mapping?: Record<string, string | null>; commit?: boolean; onProgress?: (p: UploadProgress) => void }) =>
      uploadFile<ImportPreview>(`/api/boms/${enc(bomId)}/import`, file, {
        fields: { mapping: mapping ? JSON.stringify(mapping) : undefined },
        query: { commit: commit ? 'true' : undefined },
        onProgress,
      }),
    onSuccess: async (result, { commit }) => {
      if (!commit) return;
      await Promise.all([queryClient.invalidateQueries({ queryKey: bomKeys.lines(bomId) }), invalidateDerived(queryClient, bomId)]);
    },
  });
}

type BulkAnswer = { created: Line[]; updated: Line[]; deleted: string[] };

export type LineSaveContext = { before: Map<string, Line> };

export type LineSaveHandlers = {
  /** A change reached the server; `before` holds the lines as they were, for undo. */
  onSaved?: (change: LineChange, saved: SavedLines, before: Map<string, Line>, resolve: (id: string) => string) => void;
  onFailed?: (change: LineChange, error: unknown) => void;
};

/**
 * Saves edits of the Lines grid as they are made. Each change shows at once (an
 * optimistic write of the lines query), then goes out in order: the mutations share one
 * scope, so a second edit of a line waits for the first and is sent with the version the
 * first one returned, read from the cache when it leaves (not when it was typed). Lines
 * added but not yet saved have temporary ids, mapped to the real ones on the way out.
 * On failure the lines are read again from the server; the handlers say what happened.
 */
export function useSaveLines(bomId: string, handlers: LineSaveHandlers = {}) {
  const queryClient = useQueryClient();
  const realIds = useRef(new Map<string, string>());
  const latest = useRef(handlers);
  useEffect(() => {
    latest.current = handlers;
  });

  // Versions the server last answered, for a line the cache no longer shows (added and
  // removed again before its own save came back).
  const knownVersions = useRef(new Map<string, number>());
  const resolve = (id: string) => realIds.current.get(id) ?? id;
  const current = () => queryClient.getQueryData<Line[]>(bomKeys.lines(bomId)) ?? [];

  const send = async (change: LineChange): Promise<SavedLines> => {
    const byId = new Map(current().map((line) => [line.id, line]));
    const versionOf = (id: string) => {
      const real = resolve(id);
      if (isTempId(real)) throw new Error('A line this edit needs was not saved.');
      const version = (byId.get(id) ?? byId.get(real))?.version ?? knownVersions.current.get(real);
      if (version === undefined) throw new Error('A line this edit needs is no longer in the BOM.');
      return { id: real, version };
    };
    const base = `/api/boms/${enc(bomId)}/lines`;
    const { create, update } = change;
    const removals = change.delete;

    if (create.length === 0 && update.length === 1 && removals.length === 0) {
      const { id, version } = versionOf(update[0].id);
      const line = await api.patch<Line>(`${base}/${enc(id)}`, { ...update[0].patch, version });
      return { created: [], updated: [line], deleted: [] };
    }
    if (create.length === 1 && update.length === 0 && removals.length === 0) {
      const line = await api.post<Line>(base, create[0].draft);
      return { created: [line], updated: [], deleted: [] };
    }
    if (create.length === 0 && update.length === 0 && removals.length === 1) {
      const { id, version } = versionOf(removals[0]);
      await api.delete(`${base}/${enc(id)}`, { query: { version } });
      return { created: [], updated: [], deleted: [id] };
    }
    const body = {
      create: create.map((c) => c.draft satisfies LineDraft),
      update: update.map((u) => ({ ...(u.patch satisfies LinePatch), ...versionOf(u.id) })),
      delete: removals.map((id) => versionOf(id)),
    };
    return api.post<BulkAnswer>(`${base}/bulk`, body);
  };

  return useMutation({
    scope: { id: `bom-lines:${bomId}` },
    mutationFn: send,
    onMutate: async (change): Promise<LineSaveContext> => {
      // Only a refetch started before this edit is cancelled; saves in flight go on.
      await queryClient.cancelQueries({ queryKey: bomKeys.lines(bomId), exact: true });
      const lines = current();
      const touched = new Set([...change.update.map((u) => u.id), ...change.delete]);
      const before = new Map(lines.filter((line) => touched.has(line.id)).map((line) => [line.id, line]));
      queryClient.setQueryData<Line[]>(bomKeys.lines(bomId), applyChange(lines, change));
      return { before };
    },
    onSuccess: (saved, change, context) => {
      change.create.forEach((c, i) => {
        if (saved.created[i]) realIds.current.set(c.tempId, saved.created[i].id);
      });
      for (const line of [...saved.created, ...saved.updated]) knownVersions.current.set(line.id, line.version);
      queryClient.setQueryData<Line[]>(bomKeys.lines(bomId), (lines = []) =>
        // An edit typed while its line was still unsaved names the temp id; the cache may hold the real one by now.
        applySaved(lines, { ...change, update: change.update.map((u) => ({ ...u, id: currentIdOf(lines, u.id) })) }, saved),
      );
      void invalidateDerived(queryClient, bomId);
      latest.current.onSaved?.(change, saved, context.before, resolve);
    },
    onError: (error, change) => {
      void queryClient.invalidateQueries({ queryKey: bomKeys.lines(bomId) });
      void invalidateDerived(queryClient, bomId);
      latest.current.onFailed?.(change, error);
    },
  });

  /** The id a line has in the cache now: its temp id until its own save answered. */
  function currentIdOf(lines: Line[], id: string): string {
    if (lines.some((line) => line.id === id)) return id;
    return resolve(id);
  }
}
