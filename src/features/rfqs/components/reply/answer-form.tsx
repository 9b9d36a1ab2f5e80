import { useState } from 'react';
import { FormProvider, useForm, useWatch, type Path } from 'react-hook-form';
import { Button } from '../../../../components/ui/button';
import { FormAlert } from '../../../../components/ui/form-alert';
import { isApiError, isTransientError } from '../../../../lib/api-client';
import type { RfqAnswerBody } from '../../../../shared/schemas/rfqs';
import type { ReplyResult, RfqReply } from '../../reply-api';
import { checkReply, formPath, initialReplyForm, isAnswered, type ReplyForm } from '../../reply-form';
import { useSubmitReply } from '../../reply-hooks';
import { ItemCard } from './item-card';

function Tally() {
  const items = useWatch<ReplyForm, 'items'>({ name: 'items' }) ?? [];
  const declined = items.filter((item) => item.declined).length;
  const priced = items.filter((item) => !item.declined && isAnswered(item)).length;
  const open = items.length - declined - priced;
  return (
    <p className="text-sm text-muted tabular-nums" aria-live="polite">
      {priced} priced · {declined} declined · {open} not answered
    </p>
  );
}

/**
 * Every requested part as a card, and one button that sends what is priced or declined.
 * Problems found here or by the server are shown beside the fields they concern.
 */
export function AnswerForm({
  token,
  view,
  onSent,
}: {
  token: string;
  view: RfqReply;
  onSent: (result: ReplyResult, body: RfqAnswerBody) => void;
}) {
  const methods = useForm<ReplyForm>({ defaultValues: initialReplyForm(view) });
  const submit = useSubmitReply(token);
  const [formError, setFormError] = useState<string | null>(null);

  const showProblems = (problems: { path: string; message: string }[]) => {
    problems.forEach((problem, n) => methods.setError(problem.path as Path<ReplyForm>, { type: 'server', message: problem.message }, { shouldFocus: n === 0 }));
  };

  const onSubmit = methods.handleSubmit((values) => {
    setFormError(null);
    methods.clearErrors();
    const checked = checkReply(values);
    if (!checked.ok) {
      showProblems(checked.problems);
      setFormError(checked.message ?? 'Some answers need a correction; see the marked fields.');
      return;
    }
    submit.mutate(checked.body, {
      onSuccess: (result) => onSent(result, checked.body),
      onError: (error) => {
        if (!isApiError(error) || isTransientError(error)) {
          setFormError('The answer could not be sent: the connection failed. Nothing was saved; try again.');
          return;
        }
        const onFields: { path: string; message: string }[] = [];
        const elsewhere: string[] = [];
        for (const detail of error.details) {
          const path = formPath(detail.path, checked.map, values, detail.message);
          if (path) onFields.push({ path, message: detail.message });
          else elsewhere.push(`${detail.path} ${detail.message}`);
        }
        showProblems(onFields);
        setFormError([error.message, ...elsewhere].join(' '));
      },
    });
  });

  return (
    <FormProvider {...methods}>
      <form onSubmit={onSubmit} noValidate aria-label="Quotation" className="flex flex-col gap-4">
        {view.items.map((item, index) => (
          <ItemCard key={item.itemId} item={item} index={index} />
        ))}
        <div className="sticky bottom-0 -mx-4 flex flex-col gap-2 border-t border-rule bg-paper/95 px-4 py-3 backdrop-blur sm:static sm:mx-0 sm:rounded-lg sm:border sm:bg-surface sm:px-5">
          {formError ? <FormAlert>{formError}</FormAlert> : null}
          <div className="flex flex-wrap items-center justify-between gap-3">
            <Tally />
            <Button type="submit" pending={submit.isPending} className="h-10 w-full sm:w-auto">
              Submit quotation
            </Button>
          </div>
        </div>
      </form>
    </FormProvider>
  );
}
