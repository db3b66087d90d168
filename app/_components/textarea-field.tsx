import { forwardRef, type TextareaHTMLAttributes } from 'react';
import { LabelledControl } from './labelled-control';

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; hint?: string; error?: string };

/** A labelled multi-line input with its hint and inline error tied to it. */
export const TextareaField = forwardRef<HTMLTextAreaElement, Props>(function TextareaField(
  { label, hint, error, className, rows = 4, ...rest },
  ref,
) {
  return (
    <LabelledControl label={label} hint={hint} error={error} className={className}>
      {(wiring) => <textarea ref={ref} rows={rows} {...wiring} {...rest} />}
    </LabelledControl>
  );
});
