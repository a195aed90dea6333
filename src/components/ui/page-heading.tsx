import type { ReactNode } from 'react';

/**
 * The page's one h1. It can take focus (tabIndex -1) so that navigation moves focus here.
 */
export function PageHeading({
  eyebrow,
  children,
  lead,
}: {
  eyebrow?: string;
  children: ReactNode;
  lead?: ReactNode;
}) {
  return (
    <header className="mb-8 max-w-2xl">
      {eyebrow && (
        <p className="mb-2 text-xs font-semibold uppercase tracking-[0.16em] text-chalk-700">
          {eyebrow}
        </p>
      )}
      <h1 tabIndex={-1} className="text-3xl font-semibold sm:text-4xl">
        {children}
      </h1>
      {lead && <p className="mt-3 text-lg text-ink-700">{lead}</p>}
    </header>
  );
}
