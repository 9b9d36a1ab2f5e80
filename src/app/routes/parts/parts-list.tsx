import { LaterReleasePage } from '../later-release';

export function PartsListRoute() {
  return (
    <LaterReleasePage title="Parts">
      The parts library, with categories, MPNs, makers, packages, ratings, HS codes and datasheets, arrives in a later
      release.
    </LaterReleasePage>
  );
}
