import { useId, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

/** A sheet of paper on the drafting table: the surface forms and lists sit on. */
export function Panel({
  title,
  description,
  children,
  className,
}: {
  title?: string;
  description?: ReactNode;
  children: ReactNode;
  className?: string;
}) {
  const id = useId();
  const headingId = title ? id : undefined;
  return (
    <section
      aria-labelledby={headingId}
      className={cx(
        'rounded-lg border border-calico-300 bg-calico-50 p-6 shadow-[0_1px_0_rgb(197_182_151/0.6),0_8px_24px_-12px_rgb(30_36_40/0.18)]',
        className,
      )}
    >
      {title && (
        <header className="mb-5">
          <h2 id={headingId} className="text-xl font-semibold">
            {title}
          </h2>
          {description && <p className="mt-1 text-sm text-ink-500">{description}</p>}
        </header>
      )}
      {children}
    </section>
  );
}
