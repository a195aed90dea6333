import type { ButtonHTMLAttributes } from 'react';
import { cx } from '../../lib/cx';

type Variant = 'primary' | 'secondary' | 'quiet';

const variants: Record<Variant, string> = {
  primary:
    'bg-denim-600 text-calico-50 shadow-sm hover:bg-denim-700 active:bg-denim-800 disabled:bg-denim-600/60',
  secondary:
    'border border-calico-400 bg-calico-50 text-ink-900 hover:border-denim-600 hover:text-denim-700 disabled:opacity-60',
  quiet: 'text-denim-700 hover:bg-denim-50 disabled:opacity-60',
};

const buttonClasses = (variant: Variant = 'primary', className?: string) =>
  cx(
    'inline-flex items-center justify-center gap-2 rounded-md px-4 py-2 text-sm font-semibold',
    'transition-colors disabled:cursor-not-allowed',
    variants[variant],
    className,
  );

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: Variant;
  /** While true the button is disabled and shows `pendingLabel`. */
  pending?: boolean;
  pendingLabel?: string;
};

export function Button({
  variant = 'primary',
  pending = false,
  pendingLabel,
  className,
  disabled,
  children,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, className)}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...rest}
    >
      {pending && (
        <span
          aria-hidden
          className="size-3.5 animate-spin rounded-full border-2 border-current border-r-transparent"
        />
      )}
      {pending && pendingLabel ? pendingLabel : children}
    </button>
  );
}
