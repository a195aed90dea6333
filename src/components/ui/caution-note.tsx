import { cx } from '../../lib/cx';

/** The standing caution: scale and sizing advice can cost fabric, so we say so plainly. */
export function CautionNote({ className }: { className?: string }) {
  return (
    <p className={cx('flex items-start gap-2 text-sm text-ink-700', className)}>
      <svg viewBox="0 0 16 16" aria-hidden className="mt-0.5 size-4 shrink-0">
        <rect x="1.5" y="1.5" width="13" height="13" fill="none" stroke="#b1532e" strokeWidth="1.5" />
        <path d="M1.5 5.5h3M1.5 9.5h3M5.5 1.5v3M9.5 1.5v3" stroke="#b1532e" strokeWidth="1.2" />
      </svg>
      <span>
        <strong className="font-semibold text-ink-900">Before you cut:</strong> measure the printed
        test square with a ruler; if it is off, so is every piece. Sizes and fit suggestions are
        guidance from your numbers, not a promise of fit. A test garment in spare cloth is cheaper
        than a ruined length.
      </span>
    </p>
  );
}
