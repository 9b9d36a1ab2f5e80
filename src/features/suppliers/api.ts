import { queryOptions } from '@tanstack/react-query';
import { api, getAllPages } from '../../lib/api-client';
import type { SupplierOut } from '../../shared/schemas/suppliers';

export type Supplier = SupplierOut;

export const supplierKeys = {
  all: ['suppliers'] as const,
  lists: () => [...supplierKeys.all, 'list'] as const,
  list: () => [...supplierKeys.lists(), {}] as const,
  details: () => [...supplierKeys.all, 'detail'] as const,
  detail: (id: string) => [...supplierKeys.details(), id] as const,
};

/** Every supplier of the workspace by name; a workspace has tens, not thousands. */
export const suppliersQueryOptions = () =>
  queryOptions({
    queryKey: supplierKeys.list(),
    queryFn: ({ signal }) => getAllPages<Supplier>('/api/suppliers', signal),
  });

export const supplierQueryOptions = (id: string) =>
  queryOptions({
    queryKey: supplierKeys.detail(id),
    queryFn: ({ signal }) => api.get<Supplier>(`/api/suppliers/${encodeURIComponent(id)}`, { signal }),
  });
