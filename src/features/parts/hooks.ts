import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { isStaleVersion } from '../../lib/stale-version';
import { uploadFile, type UploadProgress } from '../../lib/upload';
import type { PartCreateBody } from '../../shared/schemas/parts';
import { partKeys, type Part, type PartFile } from './api';

// Keys of other areas, written out rather than imported (areas do not import each
// other): a part's HS code feeds the quote board's duty; deleting a part drops its quotes.
const quotesKey = ['quotes'] as const;
const offersKey = ['quotes', 'offers'] as const;

export function useCreatePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PartCreateBody) => api.post<Part>('/api/parts', body),
    onSuccess: async (part) => {
      queryClient.setQueryData(partKeys.detail(part.id), part);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: partKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: partKeys.searches() }),
      ]);
    },
  });
}

export function useUpdatePart(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PartCreateBody & { version: number }) => api.patch<Part>(`/api/parts/${encodeURIComponent(id)}`, body),
    onSuccess: async (part) => {
      queryClient.setQueryData(partKeys.detail(id), part);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: partKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: partKeys.searches() }),
        queryClient.invalidateQueries({ queryKey: offersKey }),
      ]);
    },
    // Someone saved first: fetch their version so "Reload" has it to show.
    onError: (error) => (isStaleVersion(error) ? queryClient.invalidateQueries({ queryKey: partKeys.detail(id) }) : undefined),
  });
}

export function useDeletePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(`/api/parts/${encodeURIComponent(id)}`),
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: partKeys.detail(id) });
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: partKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: partKeys.searches() }),
        queryClient.invalidateQueries({ queryKey: quotesKey }),
      ]);
    },
  });
}

/** Uploads a datasheet with progress; `onProgress` feeds the bar. */
export function useUploadDatasheet(partId: string, onProgress: (progress: UploadProgress) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadFile<PartFile>(`/api/parts/${encodeURIComponent(partId)}/files`, file, { onProgress }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: partKeys.files(partId) }),
  });
}

export function useRemoveDatasheet(partId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fileId: string) => api.delete(`/api/files/${encodeURIComponent(fileId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: partKeys.files(partId) }),
  });
}
