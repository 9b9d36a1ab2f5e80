import { LaterReleasePage } from '../later-release';

export function SuppliersListRoute() {
  return (
    <LaterReleasePage title="Suppliers">
      Suppliers, with their contacts, currencies, default Incoterms and quotes, arrive in a later release.
    </LaterReleasePage>
  );
}
