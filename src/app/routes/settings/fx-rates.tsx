import { LaterReleasePage } from '../later-release';

export function FxRatesRoute() {
  return (
    <LaterReleasePage title="FX rates">
      FX rates, entered by hand or imported from a CSV file, arrive in a later release.
    </LaterReleasePage>
  );
}
