import { LaterReleasePage } from '../later-release';

export function QuoteBoardRoute() {
  return (
    <LaterReleasePage title="Quote board">
      The quote board, which sets every offer for one part side by side in landed unit cost, arrives in a later release.
    </LaterReleasePage>
  );
}
