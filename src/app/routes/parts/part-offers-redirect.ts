import { redirect, type LoaderFunctionArgs } from 'react-router-dom';

/** `/parts/:id/offers` is the quote board opened on that part. */
export function partOffersLoader({ params, request }: LoaderFunctionArgs) {
  const search = new URL(request.url).searchParams;
  search.set('part', params.id ?? '');
  return redirect(`/quote-board?${search.toString()}`);
}
