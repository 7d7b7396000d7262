import type { TextareaHTMLAttributes } from 'react';
import { cx } from '../../lib/cx';
import { controlClasses } from './control-classes';

export type TextareaProps = TextareaHTMLAttributes<HTMLTextAreaElement>;

export function Textarea({ className, rows = 4, ...rest }: TextareaProps) {
  return <textarea rows={rows} className={cx(controlClasses, 'leading-relaxed', className)} {...rest} />;
}
