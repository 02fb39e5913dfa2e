// The submit step every form shares: parse the values with the shared zod schema, show what is
// wrong beside each field, otherwise hand the parsed values to the mutation. Field errors from
// the server (same dotted keys) are merged in, the client's own taking precedence.
import type { UseMutationResult } from '@tanstack/react-query';
import { useState } from 'react';
import type { z } from 'zod';
import { apiFieldErrors, validateForm, type FieldErrors } from '../lib/form-errors';

export function useValidatedSubmit<TData, TVariables>(
  schema: z.ZodType<TVariables>,
  mutation: UseMutationResult<TData, Error, TVariables>,
) {
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors: FieldErrors = { ...apiFieldErrors(mutation.error), ...clientErrors };

  function submit(values: unknown, onSuccess?: (data: TData) => void): void {
    const checked = validateForm(schema, values);
    if (!checked.ok) {
      setClientErrors(checked.fields);
      return;
    }
    setClientErrors({});
    mutation.mutate(checked.data, { onSuccess });
  }

  return { errors, submit, setClientErrors };
}
