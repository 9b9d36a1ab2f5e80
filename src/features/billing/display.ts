import { currencyPlaces, formatDecimal } from '../../lib/money';
import type { BillingStatus, PlanLimits } from './api';

const longDate = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

/** "10 December 2026": a date in words, for renewals and grace periods. */
export function dateInWords(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : longDate.format(date);
}

/** Whole days from `now` until `iso`, rounded up (a grace period ending tonight has 1 day left). */
export function daysUntil(iso: string, now = Date.now()): number {
  return Math.max(0, Math.ceil((new Date(iso).getTime() - now) / 86_400_000));
}

/**
 * An amount in a currency's minor unit (what the payment service sends: 2900 cents) as
 * its major unit ("29.00"), by string shifting so no binary float rounds it.
 */
export function minorToMajor(minor: number, currency: string): string {
  const places = currencyPlaces(currency.toUpperCase());
  const negative = minor < 0;
  const digits = String(Math.abs(Math.trunc(minor))).padStart(places + 1, '0');
  const text = places ? `${digits.slice(0, -places)}.${digits.slice(-places)}` : digits;
  return formatDecimal(`${negative ? '-' : ''}${text}`, places);
}

/** A plan's monthly price: "Free" or "29.00 USD a month" (plans are priced in US dollars). */
export function planPrice(monthlyCents: number): string {
  return monthlyCents === 0 ? 'Free' : `${minorToMajor(monthlyCents, 'USD')} USD a month`;
}

export const statusLabels: Record<BillingStatus, string> = {
  none: 'Free',
  active: 'Active',
  past_due: 'Payment past due',
  canceled: 'Subscription ended',
};

/** What a plan allows, one short line per limit. */
export function limitLines(limits: PlanLimits): string[] {
  return [
    limits.boms === null ? 'Unlimited BOMs' : `Up to ${limits.boms} BOMs`,
    limits.members === null ? 'Unlimited members' : `Up to ${limits.members} members (invitations included)`,
    limits.rfq ? 'Requests for quotation to suppliers' : 'No requests for quotation',
    limits.apiTokens ? 'API tokens for scripts' : 'No API tokens',
  ];
}
