import type { InputHTMLAttributes } from 'react';
import { cx } from '../../lib/cx';
import { controlClasses } from './control-classes';

export type InputProps = InputHTMLAttributes<HTMLInputElement>;

export function Input({ className, type = 'text', ...rest }: InputProps) {
  return <input type={type} className={cx(controlClasses, className)} {...rest} />;
}
