import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import type { RfqCreateBody } from '../../shared/schemas/rfqs';
import { rfqKeys, type RfqDetail } from './api';

/** Sends a request: the server mails each supplier a private link once it is stored. */
export function useCreateRfq() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RfqCreateBody) => api.post<RfqDetail>('/api/rfqs', body),
    onSuccess: async (rfq) => {
      queryClient.setQueryData(rfqKeys.detail(rfq.id), rfq);
      await queryClient.invalidateQueries({ queryKey: rfqKeys.lists() });
    },
  });
}

/** Reminds every supplier who has not answered; each gets a fresh link and the old one stops working. */
export function useSendReminders(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ reminded: number }>(`/api/rfqs/${encodeURIComponent(id)}/reminders`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rfqKeys.detail(id) }),
  });
}

/** Closes the request: the suppliers' links stop working. */
export function useCloseRfq(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<RfqDetail>(`/api/rfqs/${encodeURIComponent(id)}/close`),
    onSuccess: async (rfq) => {
      queryClient.setQueryData(rfqKeys.detail(id), rfq);
      await queryClient.invalidateQueries({ queryKey: rfqKeys.lists() });
    },
  });
}
