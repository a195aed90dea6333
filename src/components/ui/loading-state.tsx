/** A calm placeholder while data loads; announced politely. */
export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="flex items-center gap-2 text-sm text-ink-500">
      <span
        aria-hidden
        className="size-3.5 animate-spin rounded-full border-2 border-denim-600 border-r-transparent"
      />
      {label}
    </p>
  );
}
