import { isApiError } from './api-client';

export type FieldErrors = Record<string, string>;

export type FormErrors = {
  /** Per-field messages, keyed by the field's name in the request body. */
  fields: FieldErrors;
  /** One sentence about the whole form, for its alert region. */
  message: string | null;
};

/** How a form words a known error code: its own sentence, and messages beside fields. */
export type KnownErrors = Record<string, { message?: string; fields?: FieldErrors }>;

/**
 * What a form should show: the client's own checks first, else what the server said.
 */
export function formErrorsOf(
  clientErrors: FieldErrors,
  serverError: unknown,
  known: KnownErrors = {},
): FormErrors {
  if (Object.keys(clientErrors).length > 0) {
    return { fields: clientErrors, message: 'Some fields need another look; see the notes beside them.' };
  }
  if (!serverError) return { fields: {}, message: null };
  if (isApiError(serverError)) {
    const wording = known[serverError.code];
    return {
      fields: { ...wording?.fields, ...serverError.fields },
      message: wording?.message ?? serverError.message,
    };
  }
  return { fields: {}, message: 'Something went wrong. Please try again.' };
}

export const MIN_PASSWORD_LENGTH = 10;

export function passwordProblem(password: string): string | null {
  if (password.length === 0) return 'Enter a password.';
  if (password.length < MIN_PASSWORD_LENGTH) {
    return `Use at least ${MIN_PASSWORD_LENGTH} characters.`;
  }
  return null;
}

/** Problems of a new password typed twice, keyed by `name` and `repeat`. */
export function newPasswordProblems(name: string, password: string, repeat: string): FieldErrors {
  const issue = passwordProblem(password);
  if (issue) return { [name]: issue };
  return repeat === password ? {} : { repeat: 'The two passwords differ.' };
}

export function emailProblem(email: string): string | null {
  const trimmed = email.trim();
  if (trimmed === '') return 'Enter your e-mail address.';
  if (!/^[^\s@]+@[^\s@]+$/.test(trimmed)) return 'That does not look like an e-mail address.';
  return null;
}
