import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import { can, type Action } from '../../shared/permissions';
import type { Role } from '../../shared/schemas/common';
import { Wordmark } from '../ui/wordmark';

type NavItem = { to: string; label: string; action: Action | null };

// The areas of the product in our own names (product brief, "Areas of the app").
const areas: NavItem[] = [
  { to: '/boms', label: 'BOMs', action: 'boms.read' },
  { to: '/parts', label: 'Parts', action: 'parts.read' },
  { to: '/tools', label: 'Circuit helpers', action: null },
  { to: '/suppliers', label: 'Suppliers', action: 'suppliers.read' },
  { to: '/quote-board', label: 'Quote board', action: 'quotes.read' },
  { to: '/rfqs', label: 'RFQs', action: 'rfqs.read' },
];

const settings: NavItem[] = [
  { to: '/settings/landed-cost-profiles', label: 'Landed-cost profiles', action: 'profiles.read' },
  { to: '/settings/fx-rates', label: 'FX rates', action: 'fx.read' },
  { to: '/settings/stress-policies', label: 'Stress policies', action: 'policies.read' },
  { to: '/settings/members', label: 'Members', action: 'members.read' },
  { to: '/settings/tokens', label: 'API tokens', action: 'tokens.own' },
  { to: '/settings/billing', label: 'Plan & billing', action: 'billing.manage' },
];

const reference: NavItem[] = [{ to: '/api-reference', label: 'API reference', action: null }];

function NavList({ items, role }: { items: NavItem[]; role: Role }) {
  return (
    <ul className="flex flex-col gap-0.5">
      {items
        .filter((item) => item.action === null || can(role, item.action))
        .map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              className={({ isActive }) =>
                [
                  'block rounded-md border-l-2 px-3 py-1.5 text-sm',
                  isActive
                    ? 'border-copper bg-surface font-medium text-ink'
                    : 'border-transparent text-muted hover:bg-surface/70 hover:text-ink',
                ].join(' ')
              }
            >
              {item.label}
            </NavLink>
          </li>
        ))}
    </ul>
  );
}

/**
 * The frame of every signed-in screen: the areas on the left (only those the role may
 * see), the workspace and the person at the top. `account` holds the workspace
 * switcher, name, role and sign-out, which the app composes from the auth area.
 */
export function AppLayout({ role, account, children }: { role: Role; account: ReactNode; children: ReactNode }) {
  return (
    <div className="min-h-screen md:grid md:grid-cols-[15rem_1fr]">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-surface focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <aside className="border-b border-rule bg-paper md:sticky md:top-0 md:h-screen md:overflow-y-auto md:border-r md:border-b-0">
        <div className="px-5 pt-5 pb-4">
          <Link to="/boms" className="inline-block rounded-md">
            <Wordmark />
          </Link>
        </div>
        <nav aria-label="Main" className="flex flex-col gap-5 px-2 pb-6">
          <NavList items={areas} role={role} />
          <div>
            <h2 className="px-3 pb-1 text-xs font-semibold tracking-wide text-muted uppercase">Settings</h2>
            <NavList items={settings} role={role} />
          </div>
          <NavList items={reference} role={role} />
        </nav>
      </aside>
      <div className="flex min-w-0 flex-col">
        <header className="flex min-h-14 flex-wrap items-center justify-end gap-x-4 gap-y-2 border-b border-rule bg-surface px-6 py-2">
          {account}
        </header>
        <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-6 py-6 focus:outline-none">
          {children}
        </main>
      </div>
    </div>
  );
}
