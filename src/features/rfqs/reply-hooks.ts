import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { uploadFile } from '../../lib/upload';
import type { RfqAnswerBody } from '../../shared/schemas/rfqs';
import { rfqReplyKeys, replySheetUploadPath, replySubmitPath, type ReplyResult } from './reply-api';

/** Sends the supplier's answer; offers become quotes in the buyer's workspace at once. */
export function useSubmitReply(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RfqAnswerBody) => api.post<ReplyResult>(replySubmitPath(token), body),
    // The page's own view now lists the answers; the thank-you reads them from there.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rfqReplyKeys.detail(token) }),
  });
}

/** Uploads the filled answer sheet: the same checks as the form, all or nothing. */
export function useUploadReplySheet(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadFile<ReplyResult>(replySheetUploadPath(token), file),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rfqReplyKeys.detail(token) }),
  });
}
