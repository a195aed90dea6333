/** A field's label and, under it, what the field expects (`hintId` lets the input point at it). */
export function FieldLabel({ htmlFor, label, hint, hintId }: { htmlFor: string; label: string; hint?: string; hintId?: string }) {
  return (
    <>
      <label htmlFor={htmlFor} className="text-sm font-semibold text-ink-900">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-xs text-ink-500">
          {hint}
        </p>
      )}
    </>
  );
}
