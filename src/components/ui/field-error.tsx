/** A field's or a group's error message, under it: the red diamond and the text (nothing when there is none). */
export function FieldError({ id, children }: { id?: string; children?: string }) {
  if (!children) return null;
  return (
    <p id={id} className="flex items-start gap-1.5 text-sm font-medium text-madder-700">
      <span aria-hidden className="mt-1.5 size-2 shrink-0 rotate-45 bg-madder-700" />
      {children}
    </p>
  );
}
