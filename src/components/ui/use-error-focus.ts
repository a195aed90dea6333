import { useEffect, type RefObject } from 'react';

/**
 * After a failed submit, move focus to the first field marked invalid, or else to the
 * form's alert, so keyboard and screen-reader users land on the problem.
 * `failure` must be a new value for each failed attempt (an error object or a counter).
 */
export function useErrorFocus(formRef: RefObject<HTMLFormElement | null>, failure: unknown) {
  useEffect(() => {
    if (!failure) return;
    const form = formRef.current;
    if (!form) return;
    const target =
      form.querySelector<HTMLElement>('[aria-invalid="true"]') ??
      form.querySelector<HTMLElement>('[data-form-alert]');
    target?.focus();
  }, [formRef, failure]);
}
