import { queryOptions } from '@tanstack/react-query';
import { api, getAllPages } from '../../lib/api-client';

export type RfqState = 'open' | 'closed';
/** A supplier's progress on one request; `overdue` is sent or opened past the reply-by date. */
export type RecipientStatus = 'sent' | 'opened' | 'answered' | 'declined' | 'overdue';

export type RfqListItem = {
  id: string;
  title: string;
  state: RfqState;
  quantities: number[];
  replyBy: string;
  /** Suppliers asked, and how many of them answered or declined. */
  recipients: number;
  answered: number;
  createdAt: string;
};

export type RfqAnswer = { itemId: string; declined: boolean; quoteId: string | null };

export type RfqRecipient = {
  id: string;
  supplierId: string;
  supplierName: string;
  status: RecipientStatus;
  sentAt: string | null;
  openedAt: string | null;
  answeredAt: string | null;
  remindedAt: string | null;
  answers: RfqAnswer[];
};

export type RfqItem = { id: string; partId: string; internalPn: string; mpn: string; description: string };

export type RfqDetail = {
  id: string;
  title: string;
  bomId: string | null;
  quantities: number[];
  replyBy: string;
  state: RfqState;
  message: string;
  closedAt: string | null;
  createdAt: string;
  version: number;
  items: RfqItem[];
  recipients: RfqRecipient[];
};

export const rfqKeys = {
  all: ['rfqs'] as const,
  lists: () => [...rfqKeys.all, 'list'] as const,
  list: () => [...rfqKeys.lists(), {}] as const,
  details: () => [...rfqKeys.all, 'detail'] as const,
  detail: (id: string) => [...rfqKeys.details(), id] as const,
};

/** Every request of the workspace, newest first, with its answer counts. */
export const rfqsQueryOptions = () =>
  queryOptions({
    queryKey: rfqKeys.list(),
    queryFn: ({ signal }) => getAllPages<RfqListItem>('/api/rfqs', signal),
  });

export const rfqQueryOptions = (id: string) =>
  queryOptions({
    queryKey: rfqKeys.detail(id),
    queryFn: ({ signal }) => api.get<RfqDetail>(`/api/rfqs/${encodeURIComponent(id)}`, { signal }),
  });
