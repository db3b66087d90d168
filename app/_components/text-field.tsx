import { forwardRef, type InputHTMLAttributes } from 'react';
import { LabelledControl } from './labelled-control';

type Props = InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string; error?: string };

/** A labelled input with its hint and inline error tied to it for assistive technology. */
export const TextField = forwardRef<HTMLInputElement, Props>(function TextField(
  { label, hint, error, className, ...rest },
  ref,
) {
  return (
    <LabelledControl label={label} hint={hint} error={error} className={className}>
      {(wiring) => <input ref={ref} {...wiring} {...rest} />}
    </LabelledControl>
  );
});
