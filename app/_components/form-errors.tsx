/** The form-level error (a conflict, a refused role, a server failure), announced to screen readers. */
export function FormError({ message }: { message: string | null | undefined }) {
  if (!message) return null;
  return (
    <p
      data-testid="form-error"
      role="alert"
      className="rounded-md border border-severity-danger/30 bg-copper-50 px-3 py-2 text-sm text-severity-danger"
    >
      {message}
    </p>
  );
}

/** A confirmation after an action succeeded. */
export function FormNotice({
  message,
  testId = 'form-notice',
}: {
  message: string | null | undefined;
  testId?: string;
}) {
  if (!message) return null;
  return (
    <p
      data-testid={testId}
      role="status"
      className="rounded-md border border-tide-100 bg-tide-50 px-3 py-2 text-sm text-tide-700 break-words"
    >
      {message}
    </p>
  );
}
