import { cx } from '../../lib/cx';

/**
 * Blockwright's mark: a trouser-leg block on a denim tile, a tape measure across the hip,
 * a chalk notch on the side seam and a grainline. The same drawing is public/favicon.svg.
 */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 48 48" className={cx('shrink-0', className)} aria-hidden>
      <rect width="48" height="48" rx="11" fill="#243e5e" />
      <path
        d="M13.5 7H29.5L30.5 19.5C31.2 23.4 34.2 25.6 38.5 26L32.5 42.5H18L15.4 27.5C14.4 20.5 12.8 13.6 13.5 7Z"
        fill="#f5efe3"
      />
      <path d="M15.1 30.2L19 32L15.7 34.4Z" fill="#b1532e" />
      <rect x="7" y="13" width="34" height="5" rx="1" fill="#e2b144" />
      <path
        d="M10 13v2.4M14 13v2.4M18 13v3.2M22 13v2.4M26 13v2.4M30 13v3.2M34 13v2.4M38 13v2.4"
        stroke="#1e2428"
        strokeWidth="1.1"
      />
      <path
        d="M24 23.5V38.5M24 23.5l-1.8 2.6M24 23.5l1.8 2.6M24 38.5l-1.8-2.6M24 38.5l1.8-2.6"
        stroke="#243e5e"
        strokeWidth="1.4"
        strokeLinecap="round"
        fill="none"
      />
    </svg>
  );
}

/** The mark with the name beside it, for headers; the name is the accessible text. */
export function Wordmark({ className }: { className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-2.5', className)}>
      <LogoMark className="size-9" />
      <span className="font-display text-xl font-semibold tracking-tight text-ink-900">
        Blockwright
      </span>
    </span>
  );
}
