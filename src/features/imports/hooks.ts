import { useMutation, useQueryClient } from '@tanstack/react-query';
import { postQuoteImport, type ImportRequest } from './api';

// Imported quotes show in every quote list and on the quote board (the quotes key),
// written out rather than imported: areas do not import each other.
const quotesKey = ['quotes'] as const;

/** Reads a file into a preview; the server writes nothing. */
export function usePreviewQuoteImport() {
  return useMutation({ mutationFn: (request: Omit<ImportRequest, 'commit'>) => postQuoteImport({ ...request, commit: false }) });
}

/** Writes every quote of the file in one transaction, or none. */
export function useCommitQuoteImport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: Omit<ImportRequest, 'commit'>) => postQuoteImport({ ...request, commit: true }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quotesKey }),
  });
}
