import { useRef, useState } from 'react';
import { formErrorsOf, type FieldErrors, type KnownErrors } from '../../lib/form-errors';
import { useErrorFocus } from './use-error-focus';

/**
 * The error handling every form shares: problems found before sending, the server's error
 * (translated through `known`), and focus moved to the first problem after each failed attempt.
 */
export function useFormErrors(serverError: unknown, known?: KnownErrors) {
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [failure, setFailure] = useState<unknown>(null);
  const formRef = useRef<HTMLFormElement>(null);
  useErrorFocus(formRef, failure);
  return {
    formRef,
    errors: formErrorsOf(clientErrors, serverError, known),
    /** Show the problems found before sending; true when there are none and the form may go. */
    accept(problems: FieldErrors): boolean {
      setClientErrors(problems);
      if (Object.keys(problems).length === 0) return true;
      setFailure({});
      return false;
    },
    /** For a mutation's onError: marks a new failed attempt. */
    onError: (error: unknown) => setFailure(error),
  };
}
