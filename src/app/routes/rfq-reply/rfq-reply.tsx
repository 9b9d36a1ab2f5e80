import { useState } from 'react';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { ErrorState } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { isApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import type { RfqAnswerBody } from '../../../shared/schemas/rfqs';
import { rfqReplyQueryOptions, type ReplyResult } from '../../../features/rfqs/reply-api';
import { AnswerForm } from '../../../features/rfqs/components/reply/answer-form';
import { ReplySummary } from '../../../features/rfqs/components/reply/reply-summary';
import { ReplyThanks } from '../../../features/rfqs/components/reply/reply-thanks';
import { SheetPanel } from '../../../features/rfqs/components/reply/sheet-panel';
import { ReplyFrame } from './reply-frame';

export const rfqReplyLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    // Warm only: an unknown, closed or expired link is a message on this page, not a crash.
    await queryClient.ensureQueryData(rfqReplyQueryOptions(params.token ?? '')).catch(() => undefined);
    return null;
  };

function LinkProblem({ error, onRetry }: { error: unknown; onRetry: () => void }) {
  // 410: closed by the buyer or past its date, with the server's own words.
  if (isApiError(error) && error.status === 410) {
    return (
      <ReplyFrame title="This link no longer works">
        <section className="flex flex-col gap-3 rounded-lg border border-rule bg-surface p-6">
          <h1 className="text-xl font-semibold">This link no longer works</h1>
          <p className="text-sm">{error.message}</p>
          <p className="text-sm text-muted">Nothing you sent earlier is lost: the buyer keeps every answer that reached them.</p>
        </section>
      </ReplyFrame>
    );
  }
  // 404 (no such link) or 400 (not the shape of a link: a mangled copy).
  if (isApiError(error) && (error.status === 404 || error.status === 400)) {
    return (
      <ReplyFrame title="This link is not valid">
        <section className="flex flex-col gap-3 rounded-lg border border-rule bg-surface p-6">
          <h1 className="text-xl font-semibold">This link is not valid</h1>
          <p className="text-sm">
            No request for quotation answers to this link. Check that the whole link from the e-mail was copied; a reminder from the buyer
            replaces the earlier link, so use the newest e-mail.
          </p>
        </section>
      </ReplyFrame>
    );
  }
  return (
    <ReplyFrame title="Request for quotation">
      <ErrorState title="The request could not be loaded" error={error} onRetry={onRetry} />
    </ReplyFrame>
  );
}

type Sent = { result: ReplyResult; body: RfqAnswerBody | null };

/**
 * The supplier's page behind the e-mailed link: the request, one card per part to price or
 * decline, the spreadsheet alternative, and a thank-you listing what reached the buyer.
 */
export function RfqReplyRoute() {
  const { token = '' } = useParams();
  const view = useQuery(rfqReplyQueryOptions(token));
  const [sent, setSent] = useState<Sent | null>(null);
  // A new round remounts the form, so a second answer starts from the buyer's quantities.
  const [round, setRound] = useState(0);

  if (view.isPending) {
    return (
      <ReplyFrame title="Request for quotation">
        <LoadingState label="Opening the request…" />
      </ReplyFrame>
    );
  }
  if (view.isError) return <LinkProblem error={view.error} onRetry={() => void view.refetch()} />;

  const data = view.data;
  const footer = `This private link is for ${data.supplier} only and works until ${formatDate(data.expiresAt)}. Farthing carries it for ${data.buyer}; no account is needed.`;
  const answeredBefore = data.answers.length;

  return (
    <ReplyFrame title={`${data.title} — ${data.buyer}`} footer={footer}>
      <ReplySummary view={data} />
      {sent ? (
        <ReplyThanks
          view={data}
          result={sent.result}
          body={sent.body}
          onAgain={() => {
            setSent(null);
            setRound((n) => n + 1);
            window.scrollTo({ top: 0 });
          }}
        />
      ) : (
        <>
          {answeredBefore ? (
            <FormAlert tone="info">
              You have answered {answeredBefore === 1 ? '1 part' : `${answeredBefore} parts`} of this request already. A new answer adds new
              offers for the parts you fill in.
            </FormAlert>
          ) : null}
          <SheetPanel token={token} onSent={(result) => setSent({ result, body: null })} />
          <div className="flex flex-col gap-1">
            <h2 className="text-lg font-semibold">Your offer, part by part</h2>
            <p className="text-sm text-muted">
              Price the parts you supply and decline the others. Parts you leave untouched stay open until you answer them.
            </p>
          </div>
          <AnswerForm
            key={round}
            token={token}
            view={data}
            onSent={(result, body) => {
              setSent({ result, body });
              window.scrollTo({ top: 0 });
            }}
          />
        </>
      )}
    </ReplyFrame>
  );
}
