import { useParams } from 'react-router-dom';
import type { Params } from 'react-router-dom';

/** The BOM revision in the address (`/boms/:bomId/…`). */
export function bomIdFrom(params: Params): string {
  const id = params.bomId;
  if (!id) throw new Response('No BOM in the address', { status: 404 });
  return id;
}

export function useBomId(): string {
  return bomIdFrom(useParams());
}
