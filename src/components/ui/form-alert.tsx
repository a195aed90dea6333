import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

type Tone = 'error' | 'success' | 'note';

const tones: Record<Tone, string> = {
  error: 'border-madder-700/40 bg-madder-50 text-madder-700',
  success: 'border-sage-700/40 bg-sage-50 text-sage-700',
  note: 'border-tape-400 bg-tape-100 text-ink-900',
};

/**
 * A message about a whole form. The live region is always in the page, so assistive
 * technology announces a message when it appears; `data-form-alert` lets a form move focus here.
 */
export function FormAlert({
  tone = 'error',
  children,
  className,
}: {
  tone?: Tone;
  children?: ReactNode;
  className?: string;
}) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={className}>
      {children ? (
        <div
          data-form-alert
          tabIndex={-1}
          className={cx('rounded-md border px-3.5 py-2.5 text-sm font-medium', tones[tone])}
        >
          {children}
        </div>
      ) : null}
    </div>
  );
}
