import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { stressKeys, type StressWaiver, type SwapResult } from './api';

const enc = encodeURIComponent;

/** Operating-point values in base units (V, A, W, °C), or the trade's notation as text; null clears. */
export type OperatingPointValues = Partial<Record<'voltageV' | 'currentA' | 'powerW' | 'ambientC', number | string | null>>;
export type OperatingPointWrite = { id: string; version: number; operatingPoint: OperatingPointValues };

/**
 * Everything a change of a line's part or operating point makes stale: the BOM's page
 * (lines, cost roll and so the running total, volume curve, ladder, stress check), the
 * BOM list's cost and tally, and any cost comparison.
 */
function invalidateBom(queryClient: QueryClient, bomId: string) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: stressKeys.bom(bomId) }),
    queryClient.invalidateQueries({ queryKey: stressKeys.lists() }),
    queryClient.invalidateQueries({ queryKey: stressKeys.compares() }),
  ]);
}

/** A written waiver for a line beyond the policy; the server records who and when. */
export function useWaiveLine(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ lineId, reason }: { lineId: string; reason: string }) =>
      api.post<StressWaiver & { lineId: string }>(`/api/boms/${enc(bomId)}/lines/${enc(lineId)}/waivers`, { reason }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stressKeys.check(bomId) }),
  });
}

/**
 * Puts another part on a line. On a released BOM the server makes the next revision and
 * swaps there (`newRevision`); the caller then goes to it. Resolves once the lines, the
 * cost roll and the stress check have been read again, so the running total shows the
 * new landed cost when the dialog closes.
 */
export function useSwapPart(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ lineId, partId, version }: { lineId: string; partId: string; version: number }) =>
      api.post<SwapResult>(`/api/boms/${enc(bomId)}/lines/${enc(lineId)}/swap`, { partId, version }),
    onSuccess: async (result) => {
      await Promise.all([
        invalidateBom(queryClient, bomId),
        result.newRevision ? queryClient.invalidateQueries({ queryKey: stressKeys.details() }) : null,
      ]);
    },
    onError: () => queryClient.invalidateQueries({ queryKey: stressKeys.lines(bomId) }),
  });
}

/**
 * Writes operating points of one or more lines, each at the version it was read at: one
 * line by PATCH, several in one transaction by the bulk endpoint (all or none).
 */
export function useWriteOperatingPoints(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (writes: OperatingPointWrite[]) => {
      if (writes.length === 1) {
        const [w] = writes;
        await api.patch(`/api/boms/${enc(bomId)}/lines/${enc(w.id)}`, { operatingPoint: w.operatingPoint, version: w.version });
        return;
      }
      await api.post(`/api/boms/${enc(bomId)}/lines/bulk`, { update: writes });
    },
    onSuccess: () => invalidateBom(queryClient, bomId),
    // A stale version means someone saved the line meanwhile: read the lines again.
    onError: () => queryClient.invalidateQueries({ queryKey: stressKeys.lines(bomId) }),
  });
}

/** Chooses the stress policy a BOM is checked against (null: the workspace default). */
export function useChooseBomPolicy(bomId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ stressPolicyId, version }: { stressPolicyId: string | null; version: number }) =>
      api.patch(`/api/boms/${enc(bomId)}`, { stressPolicyId, version }),
    onSuccess: () => invalidateBom(queryClient, bomId),
    onError: () => queryClient.invalidateQueries({ queryKey: stressKeys.bom(bomId), exact: true }),
  });
}
