import { queryOptions } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import type { Incoterm } from './reply-form';

/** One requested part as the supplier sees it through the private link. */
export type ReplyItem = {
  itemId: string;
  internalPn: string;
  mpn: string;
  manufacturer: string;
  description: string;
  package: string;
  note: string;
};

/** GET /api/rfq-replies/:token: the request as its supplier sees it, without an account. */
export type RfqReply = {
  title: string;
  /** The buyer's workspace name. */
  buyer: string;
  supplier: string;
  replyBy: string;
  quantities: number[];
  message: string;
  status: 'opened' | 'answered' | 'declined';
  defaultCurrency: string;
  defaultIncoterm: Incoterm;
  expiresAt: string;
  items: ReplyItem[];
  answers: { itemId: string; declined: boolean; quoteId: string | null }[];
};

/** What the server answers a submitted form or sheet. */
export type ReplyResult = { quotes: number; declined: number; status: 'answered' | 'declined' };

export const rfqReplyKeys = {
  all: ['rfq-replies'] as const,
  detail: (token: string) => [...rfqReplyKeys.all, token] as const,
};

const replyPath = (token: string) => `/api/rfq-replies/${encodeURIComponent(token)}`;

export const rfqReplyQueryOptions = (token: string) =>
  queryOptions({
    queryKey: rfqReplyKeys.detail(token),
    queryFn: ({ signal }) => api.get<RfqReply>(replyPath(token), { signal }),
    // The supplier fills a long form: a refetch on focus must not reset what is typed.
    staleTime: Number.POSITIVE_INFINITY,
    refetchOnWindowFocus: false,
  });

/** The answer sheet to fill offline (a plain link: the browser downloads it). */
export const replySheetUrl = (token: string) => `${replyPath(token)}/sheet.xlsx`;
export const replySheetUploadPath = (token: string) => `${replyPath(token)}/sheet`;
export const replySubmitPath = replyPath;
