import { todayIso } from './reply-form';

/**
 * An open request past its reply-by date with suppliers still silent. The server marks
 * each such supplier `overdue` on the detail; the list carries counts only, so it is
 * worked out here the same way (dates compared in UTC, as the server does).
 */
export function isOverdue(rfq: { state: string; replyBy: string; answered: number; recipients: number }, today = todayIso()): boolean {
  return rfq.state === 'open' && rfq.replyBy < today && rfq.answered < rfq.recipients;
}
