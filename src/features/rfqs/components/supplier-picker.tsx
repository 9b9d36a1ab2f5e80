import { Link } from 'react-router-dom';
import { fieldMessage } from '../../../lib/form-errors';

/** What the picker needs of a supplier. */
export type SupplierChoice = { id: string; name: string; currency: string; active: boolean; contactEmails: string[] };

/** Why a supplier cannot be asked, or null when it can. */
export function whyNotAskable(supplier: SupplierChoice): string | null {
  if (!supplier.active) return 'Inactive: make it active on its page to ask it.';
  if (!supplier.contactEmails.length) return 'No contact e-mail: the link goes by e-mail, so add one on its page first.';
  return null;
}

/**
 * The suppliers to ask, one box each. A supplier without a contact e-mail (or an inactive
 * one) is shown but cannot be ticked, with the reason and the way to its page.
 */
export function SupplierPicker({
  suppliers,
  value,
  onChange,
  error,
}: {
  suppliers: SupplierChoice[];
  value: string[];
  onChange: (next: string[]) => void;
  error?: string;
}) {
  const sorted = [...suppliers].sort((a, b) => Number(Boolean(whyNotAskable(a))) - Number(Boolean(whyNotAskable(b))) || a.name.localeCompare(b.name));
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="text-sm font-medium text-ink">Suppliers to ask</legend>
      <p className="text-xs text-muted">Each one receives its own private link by e-mail; they never see each other.</p>
      {suppliers.length === 0 ? (
        <p className="rounded-md border border-dashed border-rule px-3 py-3 text-sm text-muted">
          No suppliers yet. Add them in{' '}
          <Link to="/suppliers" className="underline">
            Suppliers
          </Link>{' '}
          with a contact e-mail.
        </p>
      ) : (
        <ul className="grid gap-1.5 sm:grid-cols-2">
          {sorted.map((supplier) => {
            const reason = whyNotAskable(supplier);
            const id = `supplier-${supplier.id}`;
            const checked = value.includes(supplier.id);
            return (
              <li key={supplier.id} className={`flex items-start gap-2 rounded-md border px-3 py-2 ${reason ? 'border-rule bg-paper' : 'border-rule bg-surface'}`}>
                <input
                  id={id}
                  type="checkbox"
                  className="mt-0.5 size-4 accent-copper"
                  checked={checked}
                  disabled={Boolean(reason)}
                  aria-describedby={`${id}-info`}
                  onChange={(event) => onChange(event.target.checked ? [...value, supplier.id] : value.filter((s) => s !== supplier.id))}
                />
                <div className="flex min-w-0 flex-col">
                  <label htmlFor={id} className={`text-sm font-medium ${reason ? 'text-muted' : 'text-ink'}`}>
                    {supplier.name}
                  </label>
                  <p id={`${id}-info`} className="text-xs text-muted">
                    {reason ? (
                      <>
                        {reason}{' '}
                        <Link to={`/suppliers/${supplier.id}`} className="underline">
                          Open {supplier.name}
                        </Link>
                      </>
                    ) : (
                      `${supplier.currency} · ${supplier.contactEmails.join(', ')}`
                    )}
                  </p>
                </div>
              </li>
            );
          })}
        </ul>
      )}
      {error ? <p className="text-xs font-medium text-brick">{fieldMessage('Suppliers', error)}</p> : null}
    </fieldset>
  );
}
