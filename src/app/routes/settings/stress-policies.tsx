import { LaterReleasePage } from '../later-release';

export function StressPoliciesRoute() {
  return (
    <LaterReleasePage title="Stress policies">
      Stress policies, the derating limits the stress check holds each part to, arrive in a later release.
    </LaterReleasePage>
  );
}
