import { Link, type LinkProps } from 'react-router-dom';
import { cx } from '../../lib/cx';

const textLinkClasses =
  'font-semibold text-denim-700 underline decoration-denim-100 decoration-2 underline-offset-4 hover:decoration-denim-600';

export function TextLink({ className, ...props }: LinkProps) {
  return <Link className={cx(textLinkClasses, className)} {...props} />;
}
