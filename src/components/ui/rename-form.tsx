import { useState, type FormEvent, type KeyboardEvent } from 'react';
import { formErrorsOf } from '../../lib/form-errors';
import { Button } from './button';
import { FormAlert } from './form-alert';
import { TextField } from './text-field';

/**
 * Rename something in place: the name field, "Save name" and "Cancel" (Escape cancels too). An
 * empty or too long name is refused before anything is sent; an unchanged one just closes.
 * `onRename` sends the change and calls `onDone` when it is saved; the server's refusal shows
 * beside the field.
 */
export function RenameForm({
  current,
  what,
  maxLength,
  pending,
  error,
  onRename,
  onDone,
}: {
  current: string;
  /** What is renamed, in words: "profile", "make". */
  what: string;
  maxLength: number;
  pending: boolean;
  error: unknown;
  onRename: (name: string) => void;
  onDone: () => void;
}) {
  const [name, setName] = useState(current);
  const [problem, setProblem] = useState<string | null>(null);
  const errors = formErrorsOf(problem ? { name: problem } : {}, error);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const trimmed = name.trim();
    if (trimmed === '') return setProblem(`Enter a name for the ${what}.`);
    if (trimmed.length > maxLength) return setProblem(`Keep the name to ${maxLength} characters.`);
    setProblem(null);
    if (trimmed === current) return onDone();
    onRename(trimmed);
  }

  return (
    <form noValidate onSubmit={handleSubmit} onKeyDown={(event: KeyboardEvent<HTMLFormElement>) => event.key === 'Escape' && onDone()} className="flex flex-col gap-2">
      <TextField label={`New name for “${current}”`} name="name" value={name} autoFocus onChange={(event) => setName(event.target.value)} error={errors.fields.name} />
      {!errors.fields.name && <FormAlert>{errors.message}</FormAlert>}
      <div className="flex gap-2">
        <Button type="submit" className="px-3 py-1.5" pending={pending} pendingLabel="Saving…">
          Save name
        </Button>
        <Button variant="quiet" className="px-3 py-1.5" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
