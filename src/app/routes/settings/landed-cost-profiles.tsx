import { LaterReleasePage } from '../later-release';

export function LandedCostProfilesRoute() {
  return (
    <LaterReleasePage title="Landed-cost profiles">
      Landed-cost profiles, which hold the freight, insurance, duty, fees and attrition of a shipping route, arrive in a
      later release.
    </LaterReleasePage>
  );
}
