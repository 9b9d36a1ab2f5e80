import { useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { FormAlert } from '../../../components/ui/form-alert';
import { PageHeader } from '../../../components/ui/page-header';
import { Tag } from '../../../components/ui/tag';
import { describeError } from '../../../components/ui/error-state';
import { formatDate, formatDateTime } from '../../../lib/format';
import { useSession } from '../../../features/auth/session-context';
import { rfqQueryOptions } from '../../../features/rfqs/api';
import { useCloseRfq, useSendReminders } from '../../../features/rfqs/hooks';
import { formatCount } from '../../../features/rfqs/quantities';
import { AnswersGrid } from '../../../features/rfqs/components/answers-grid';
import { RecipientsList } from '../../../features/rfqs/components/recipients-list';

export const rfqDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(rfqQueryOptions(params.id ?? ''));
    return null;
  };

// Offers of one part side by side, in landed cost: the quote board opened on that part.
const offersPath = (partId: string) => `/quote-board?part=${encodeURIComponent(partId)}`;

/** One request: each supplier's status and answers, reminders and closing. */
export function RfqDetailRoute() {
  const { id = '' } = useParams();
  const session = useSession();
  const { data: rfq } = useSuspenseQuery(rfqQueryOptions(id));
  const reminders = useSendReminders(id);
  const close = useCloseRfq(id);
  const [closing, setClosing] = useState(false);
  const mayWrite = can(session.role, 'rfqs.write');
  const open = rfq.state === 'open';
  const waiting = rfq.recipients.filter((r) => r.status === 'sent' || r.status === 'opened' || r.status === 'overdue').length;
  const answered = rfq.recipients.filter((r) => r.status === 'answered' || r.status === 'declined').length;

  const actions =
    mayWrite && open ? (
      <>
        <Button
          variant="secondary"
          pending={reminders.isPending}
          disabled={waiting === 0}
          title={waiting === 0 ? 'Every supplier has answered.' : undefined}
          onClick={() => reminders.mutate()}
        >
          Send reminders
        </Button>
        <Button variant="danger" onClick={() => setClosing(true)}>
          Close RFQ
        </Button>
      </>
    ) : null;

  return (
    <>
      <PageHeader
        title={rfq.title}
        description={
          <span className="tabular-nums">
            Reply by {formatDate(rfq.replyBy)} · {rfq.quantities.map((q) => `${formatCount(q)}`).join(' / ')} pcs · {answered} of{' '}
            {rfq.recipients.length} suppliers answered
          </span>
        }
        actions={actions}
      />
      <div className="flex flex-col gap-6">
        <p className="-mt-3 flex flex-wrap items-center gap-2 text-sm">
          <Link to="/rfqs" className="text-muted underline-offset-2 hover:underline">
            ← All RFQs
          </Link>
          {open ? <Tag tone="copper">Open</Tag> : <Tag tone="muted">Closed{rfq.closedAt ? ` ${formatDateTime(rfq.closedAt)}` : ''}</Tag>}
        </p>
        {reminders.isSuccess ? (
          <FormAlert tone="success">
            {reminders.data.reminded === 0
              ? 'Every supplier has answered; no reminder was needed.'
              : `Reminders sent to ${reminders.data.reminded === 1 ? '1 supplier' : `${reminders.data.reminded} suppliers`}, each with a fresh link (the earlier link stops working).`}
          </FormAlert>
        ) : null}
        {reminders.isError ? <FormAlert>{describeError(reminders.error)}</FormAlert> : null}
        {!open ? <FormAlert tone="info">This request is closed: the suppliers&apos; links no longer take answers.</FormAlert> : null}

        <section aria-labelledby="suppliers-title" className="flex flex-col gap-3">
          <h2 id="suppliers-title" className="text-lg font-semibold">
            Suppliers
          </h2>
          <RecipientsList recipients={rfq.recipients} partCount={rfq.items.length} />
        </section>

        <section aria-labelledby="answers-title" className="flex flex-col gap-3">
          <h2 id="answers-title" className="text-lg font-semibold">
            Answers by part
          </h2>
          <AnswersGrid rfq={rfq} offersPath={offersPath} />
        </section>

        {rfq.message ? (
          <section aria-labelledby="message-title" className="flex flex-col gap-2">
            <h2 id="message-title" className="text-lg font-semibold">
              Message to the suppliers
            </h2>
            <p className="max-w-prose rounded-lg border border-rule bg-surface px-4 py-3 text-sm whitespace-pre-line">{rfq.message}</p>
          </section>
        ) : null}
      </div>
      <ConfirmDialog
        open={closing}
        title={`Close “${rfq.title}”?`}
        confirmLabel="Close RFQ"
        pending={close.isPending}
        error={close.isError ? describeError(close.error) : null}
        onCancel={() => {
          setClosing(false);
          close.reset();
        }}
        onConfirm={() => close.mutate(undefined, { onSuccess: () => setClosing(false) })}
      >
        The suppliers&apos; links stop working at once; offers already received stay on the quote board. A closed request cannot be opened
        again.
      </ConfirmDialog>
    </>
  );
}
