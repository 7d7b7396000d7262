import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Spinner } from './Spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variantClasses: Record<ButtonVariant, string> = {
  primary: 'bg-walnut-800 text-paper hover:bg-walnut-700 active:bg-walnut-900 border border-walnut-800',
  secondary: 'bg-paper text-walnut-800 border border-line-strong hover:bg-walnut-50 active:bg-walnut-100',
  danger: 'bg-ember-600 text-paper border border-ember-600 hover:bg-ember-700 active:bg-ember-700',
  quiet: 'bg-transparent text-walnut-800 border border-transparent hover:bg-walnut-50 underline-offset-4 hover:underline',
};

/** Shared by buttons and links that look like buttons: at least 44 px tall for gloved fingers. */
export function buttonClasses(variant: ButtonVariant = 'primary', fullWidth = false): string {
  return cx(
    'inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-lg px-4 py-2 text-base font-semibold',
    'transition-colors disabled:cursor-not-allowed disabled:opacity-60',
    variantClasses[variant],
    fullWidth && 'w-full',
  );
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  fullWidth?: boolean;
  /** Shows a spinner and blocks a second press while the request runs. */
  busy?: boolean;
  busyLabel?: string;
  icon?: ReactNode;
}

export function Button({
  variant = 'primary',
  fullWidth = false,
  busy = false,
  busyLabel,
  icon,
  type = 'button',
  className,
  disabled,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button type={type} className={cx(buttonClasses(variant, fullWidth), className)} disabled={disabled || busy} aria-busy={busy || undefined} {...rest}>
      {busy ? <Spinner size="sm" label={null} /> : icon}
      <span>{busy && busyLabel ? busyLabel : children}</span>
    </button>
  );
}
