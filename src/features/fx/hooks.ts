import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { uploadFile, type UploadProgress } from '../../lib/upload';
import type { FxRateBody } from '../../shared/schemas/fx';
import { fxKeys, type FxRate } from './api';

// Rates convert every offer on the quote board (under the quotes key, written out:
// areas do not import each other).
const offersKey = ['quotes', 'offers'] as const;

function useInvalidateRates() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([queryClient.invalidateQueries({ queryKey: fxKeys.all }), queryClient.invalidateQueries({ queryKey: offersKey })]);
}

export function useAddFxRate() {
  const invalidate = useInvalidateRates();
  return useMutation({ mutationFn: (body: FxRateBody) => api.post<FxRate>('/api/fx-rates', body), onSuccess: invalidate });
}

export function useDeleteFxRate() {
  const invalidate = useInvalidateRates();
  return useMutation({ mutationFn: (id: string) => api.delete(`/api/fx-rates/${encodeURIComponent(id)}`), onSuccess: invalidate });
}

/** Imports a reference-rate feed (CSV) with upload progress; all rows or none. */
export function useImportFxRates(onProgress: (progress: UploadProgress) => void) {
  const invalidate = useInvalidateRates();
  return useMutation({
    mutationFn: (file: File) => uploadFile<{ imported: number }>('/api/fx-rates/import', file, { onProgress }),
    onSuccess: invalidate,
  });
}
