import { useState } from 'react';
import { useForm, type DefaultValues, type FieldValues, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyServerErrors } from '../../lib/form-errors';
import type { HelperEndpoints, HelperName } from './api';
import { useCircuitHelper } from './hooks';

/**
 * A helper's form: typed text read by its schema into the API's numbers, sent to the
 * helper's endpoint; the server's complaints (400 with a path per field) land on the
 * fields of the same name, since the form uses the API's field names.
 */
export function useHelperForm<N extends HelperName, V extends FieldValues>(
  name: N,
  schema: z.ZodType<HelperEndpoints[N]['input'], V>,
  defaults: DefaultValues<V>,
) {
  const helper = useCircuitHelper(name);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<V, unknown, HelperEndpoints[N]['input']>({ resolver: zodResolver(schema), defaultValues: defaults });
  const fields = Object.keys(defaults) as Path<V>[];

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    helper.mutate(input, { onError: (error) => setFormError(applyServerErrors(error, form.setError, fields)) });
  });

  return { form, helper, onSubmit, formError, errors: form.formState.errors };
}
