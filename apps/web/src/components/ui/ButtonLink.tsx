import { Link, type LinkProps } from 'react-router';
import { cx } from '../../lib/cx';
import { buttonClasses, type ButtonVariant } from './Button';

export interface ButtonLinkProps extends LinkProps {
  variant?: ButtonVariant;
  fullWidth?: boolean;
}

/** A link (it goes somewhere) dressed as a button. */
export function ButtonLink({ variant = 'primary', fullWidth = false, className, ...rest }: ButtonLinkProps) {
  return <Link className={cx(buttonClasses(variant, fullWidth), 'no-underline', className)} {...rest} />;
}
