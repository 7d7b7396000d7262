import { Link, type LinkProps } from 'react-router';
import { cx } from '../../lib/cx';

export function TextLink({ className, ...rest }: LinkProps) {
  return (
    <Link
      className={cx(
        'inline-flex min-h-touch items-center font-semibold text-walnut-700 underline decoration-resin-400 decoration-2 underline-offset-4 hover:text-walnut-900',
        className,
      )}
      {...rest}
    />
  );
}
