import { LaterReleasePage } from '../later-release';

export function RfqsListRoute() {
  return (
    <LaterReleasePage title="RFQs">
      Requests for quotation, sent to suppliers by e-mail and answered on a private link, arrive in a later release.
    </LaterReleasePage>
  );
}
