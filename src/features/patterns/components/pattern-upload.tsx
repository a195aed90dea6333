import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import { cx } from '../../../lib/cx';
import { useUploadPattern } from '../api/upload-pattern';
import type { PatternDetail } from '../types';

/** Largest file the server takes (server/http/upload.ts). */
const MAX_BYTES = 5 * 1024 * 1024;

/** Upload a pattern file; on success `onUploaded` (the route opens the review). */
export function PatternUpload({ onUploaded }: { onUploaded: (pattern: PatternDetail) => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState('');
  const upload = useUploadPattern({ onSuccess: onUploaded });
  const { formRef, errors, accept, onError } = useFormErrors(upload.error, {
    payload_too_large: { message: 'The file is larger than 5 MB.', fields: { file: 'Choose a file of 5 MB or less.' } },
  });
  const fileId = useId();
  const fileError = errors.fields.file;

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problems: Record<string, string> = {};
    if (!file) problems.file = 'Choose a pattern file.';
    else if (file.size > MAX_BYTES) problems.file = 'The file is larger than 5 MB.';
    if (!accept(problems) || !file) return;
    upload.mutate({ file, name }, { onError });
  }

  return (
    <form ref={formRef} onSubmit={handleSubmit} noValidate className="flex flex-col gap-4" aria-label="Upload a pattern">
      <FormAlert>{errors.message}</FormAlert>
      <div className="flex flex-col gap-1">
        <label htmlFor={fileId} className="text-sm font-semibold text-ink-900">
          Pattern file
        </label>
        <p id={`${fileId}-hint`} className="text-xs text-ink-500">
          SVG or DXF (ASTM D6673) with the size lines nested, or a Blockwright JSON file; up to 5 MB.
        </p>
        <input
          id={fileId}
          type="file"
          name="file"
          accept=".svg,.dxf,.json,image/svg+xml,application/json"
          aria-invalid={fileError ? true : undefined}
          aria-describedby={`${fileId}-hint${fileError ? ` ${fileId}-error` : ''}`}
          onChange={(event) => setFile(event.target.files?.[0] ?? null)}
          className={cx(
            'rounded-md border bg-calico-50 px-3 py-2 text-sm file:mr-3 file:rounded file:border-0 file:bg-denim-600 file:px-3 file:py-1 file:text-calico-50',
            fileError ? 'border-madder-700' : 'border-calico-400',
          )}
        />
        {fileError && (
          <p id={`${fileId}-error`} className="text-sm font-medium text-madder-700">
            {fileError}
          </p>
        )}
      </div>
      <TextField label="Pattern name (optional)" hint="Left empty, the name comes from the file." name="name" value={name} onChange={(event) => setName(event.target.value)} error={errors.fields.name} maxLength={120} />
      <div>
        <Button type="submit" pending={upload.isPending} pendingLabel="Reading the file…">
          Upload pattern
        </Button>
      </div>
    </form>
  );
}
