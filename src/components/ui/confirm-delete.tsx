import { useId, type ReactNode } from 'react';
import { formErrorsOf } from '../../lib/form-errors';
import { Button } from './button';
import { FormAlert } from './form-alert';

/** "Delete … for good?" in place, with "Keep it" focused first; the server's refusal is shown. */
export function ConfirmDelete({
  question,
  children,
  pending,
  error,
  onConfirm,
  onCancel,
  className = '',
}: {
  question: ReactNode;
  /** What else deleting does or leaves, in a sentence or two. */
  children?: ReactNode;
  pending: boolean;
  error: unknown;
  onConfirm: () => void;
  onCancel: () => void;
  className?: string;
}) {
  const titleId = useId();
  return (
    <div role="alertdialog" aria-labelledby={titleId} className={`rounded-md border border-madder-700/40 bg-madder-50 p-4 ${className}`}>
      <p id={titleId} className="font-semibold text-madder-700">
        {question}
      </p>
      {children && <p className="mt-1 text-sm text-ink-700">{children}</p>}
      <FormAlert className="mt-2 empty:hidden">{error ? formErrorsOf({}, error).message : null}</FormAlert>
      <div className="mt-3 flex gap-2">
        <Button className="bg-madder-700 px-3 py-1.5 hover:bg-madder-700/90" pending={pending} pendingLabel="Deleting…" onClick={onConfirm}>
          Delete for good
        </Button>
        <Button variant="secondary" className="px-3 py-1.5" autoFocus onClick={onCancel}>
          Keep it
        </Button>
      </div>
    </div>
  );
}
