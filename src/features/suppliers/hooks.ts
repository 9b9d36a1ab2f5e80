import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { isStaleVersion } from '../../lib/stale-version';
import type { SupplierCreateBody } from '../../shared/schemas/suppliers';
import { supplierKeys, type Supplier } from './api';

// Quotes carry the supplier's name, and the quote board its active flag: both under
// the quotes key, written out rather than imported (areas do not import each other).
const quotesKey = ['quotes'] as const;

export function useCreateSupplier() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SupplierCreateBody) => api.post<Supplier>('/api/suppliers', body),
    onSuccess: async (supplier) => {
      queryClient.setQueryData(supplierKeys.detail(supplier.id), supplier);
      await queryClient.invalidateQueries({ queryKey: supplierKeys.lists() });
    },
  });
}

export function useUpdateSupplier(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SupplierCreateBody & { version: number }) => api.patch<Supplier>(`/api/suppliers/${encodeURIComponent(id)}`, body),
    onSuccess: async (supplier) => {
      queryClient.setQueryData(supplierKeys.detail(id), supplier);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: supplierKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: quotesKey }),
      ]);
    },
    onError: (error) => (isStaleVersion(error) ? queryClient.invalidateQueries({ queryKey: supplierKeys.detail(id) }) : undefined),
  });
}

export function useDeleteSupplier() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(`/api/suppliers/${encodeURIComponent(id)}`),
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: supplierKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: supplierKeys.lists() });
    },
  });
}
