import type { SelectHTMLAttributes } from 'react';
import { cx } from '../../lib/cx';
import { controlClasses } from './control-classes';

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  options: readonly SelectOption[];
  /** A first, empty choice such as "All stages". */
  emptyOption?: string;
}

export function Select({ options, emptyOption, className, ...rest }: SelectProps) {
  return (
    <select className={cx(controlClasses, 'pr-8', className)} {...rest}>
      {emptyOption !== undefined ? <option value="">{emptyOption}</option> : null}
      {options.map((option) => (
        <option key={option.value} value={option.value}>
          {option.label}
        </option>
      ))}
    </select>
  );
}
