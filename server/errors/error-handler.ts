import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError, type FieldErrors } from './app-error.ts';
import { fieldErrorsOf } from '../http/parse.ts';
import { UPLOAD_LIMIT_LABEL } from '../http/upload.ts';

interface ErrorBody {
  error: { code: string; message: string; fields?: FieldErrors };
}

function bodyOf(error: AppError): ErrorBody {
  return {
    error: {
      code: error.code,
      message: error.message,
      ...(error.fields ? { fields: error.fields } : {}),
    },
  };
}

/** Errors raised by Express's body parser and by csrf-sync carry a `type` or `code` of their own. */
function translate(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return new AppError('invalid_input', 'Some fields are not valid.', 400, fieldErrorsOf(err));
  if (typeof err !== 'object' || err === null) return undefined;
  const e = err as { type?: unknown; code?: unknown; status?: unknown; limit?: unknown };
  if (e.type === 'entity.parse.failed') return new AppError('invalid_json', 'The request body is not valid JSON.', 400);
  if (e.type === 'entity.too.large')
    return new AppError('payload_too_large', 'The request body is too large.', 413);
  if (err instanceof Error && err.name === 'MulterError') {
    if (e.code === 'LIMIT_FILE_SIZE') return new AppError('payload_too_large', `The file is larger than the ${String(UPLOAD_LIMIT_LABEL)} allowed.`, 413);
    return new AppError('invalid_input', `The upload could not be read: ${err.message}.`, 400, { file: err.message });
  }
  if (e.code === 'EBADCSRFTOKEN')
    return new AppError('csrf_invalid', 'The form expired or came from another site: reload and try again.', 403);
  if (typeof e.status === 'number' && e.status >= 400 && e.status < 500)
    return new AppError('invalid_input', 'The request could not be read.', e.status);
  return undefined;
}

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = translate(err);
  if (known) {
    res.status(known.status).json(bodyOf(known));
    return;
  }
  req.log?.error({ err }, 'unhandled error');
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side.' } });
};

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('not_found', `No API route ${req.method} ${req.path}.`, 404));
};
