/** The one error type of the server. Routes and services throw it; `errorHandler` turns it into JSON. */
export type ErrorCode =
  | 'invalid_input'
  | 'invalid_json'
  | 'unauthenticated'
  | 'forbidden'
  | 'csrf_invalid'
  | 'not_found'
  | 'email_taken'
  | 'invalid_credentials'
  | 'wrong_password'
  | 'invalid_token'
  | 'last_admin'
  | 'conflict'
  | 'stale_revision'
  | 'in_use'
  | 'payload_too_large'
  | 'unprocessable'
  | 'too_many_attempts'
  | 'internal';

export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly status: number,
    readonly fields?: FieldErrors,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (message: string, fields?: FieldErrors) =>
  new AppError('invalid_input', message, 400, fields);
export const unauthenticated = () => new AppError('unauthenticated', 'Sign in to continue.', 401);
export const forbidden = (message = 'Your account may not do this.') =>
  new AppError('forbidden', message, 403);
export const notFound = (what = 'This resource') => new AppError('not_found', `${what} was not found.`, 404);
