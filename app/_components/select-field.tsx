import { forwardRef, type SelectHTMLAttributes } from 'react';
import { LabelledControl } from './labelled-control';

type Option = { value: string; label: string };
type Props = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  options: readonly Option[];
  placeholder?: string;
  hint?: string;
  error?: string;
};

/** A labelled select with its hint and inline error tied to it for assistive technology. */
export const SelectField = forwardRef<HTMLSelectElement, Props>(function SelectField(
  { label, options, placeholder, hint, error, className, ...rest },
  ref,
) {
  return (
    <LabelledControl label={label} hint={hint} error={error} className={className}>
      {(wiring) => (
        <select ref={ref} {...wiring} {...rest}>
          {placeholder !== undefined && <option value="">{placeholder}</option>}
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </LabelledControl>
  );
});
