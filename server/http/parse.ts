import { z, type ZodError, type ZodType } from 'zod';
import { AppError, type FieldErrors } from '../errors/app-error.ts';

/** One message per field path (`a.b.0`); the first issue of a field wins. */
export function fieldErrorsOf(error: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

/** Parse request input with zod; bad input becomes a 400 with a message per field. */
export function parseInput<S extends ZodType>(schema: S, value: unknown, what = 'request'): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (!result.success)
    throw new AppError('invalid_input', `Some fields of the ${what} are not valid.`, 400, fieldErrorsOf(result.error));
  return result.data;
}
