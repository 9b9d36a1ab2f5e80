import { NavLink } from 'react-router-dom';

/** The BOM page's tabs, in our own names; each is an address, so a tab can be shared and reloaded. */
export const bomTabs = [
  { path: 'lines', label: 'Lines' },
  { path: 'cost-roll', label: 'Cost roll' },
  { path: 'stress-check', label: 'Stress check' },
  { path: 'volume-curve', label: 'Volume curve' },
  { path: 'shelf-price-ladder', label: 'Shelf-price ladder' },
  { path: 'revisions', label: 'Revisions' },
] as const;

export function BomTabs({ bomId }: { bomId: string }) {
  return (
    <nav aria-label="BOM sections" className="mb-5 border-b border-rule">
      <ul className="-mb-px flex flex-wrap gap-1">
        {bomTabs.map((tab) => (
          <li key={tab.path}>
            <NavLink
              to={`/boms/${bomId}/${tab.path}`}
              className={({ isActive }) =>
                [
                  'inline-block border-b-2 px-3 py-2 text-sm whitespace-nowrap',
                  isActive ? 'border-copper font-medium text-ink' : 'border-transparent text-muted hover:border-rule hover:text-ink',
                ].join(' ')
              }
            >
              {tab.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
