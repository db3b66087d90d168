import Link from 'next/link';

/** For prospects: the result is theirs to see; saving it needs an account. */
export function SignInInvite({ nextPath }: { nextPath: string }) {
  return (
    <section
      aria-labelledby="save-title"
      className="rounded-panel border border-tide-100 bg-tide-50 p-panel"
      data-testid="sign-in-invite"
    >
      <h2 id="save-title" className="text-base font-semibold text-tide-700">
        Keep this sizing
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        Sizing is open to everyone. Sign in to save it to a customer account, add it to a quote and issue a datasheet.
      </p>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <Link
          href={`/sign-in?next=${encodeURIComponent(nextPath)}`}
          data-testid="sign-in-to-save"
          className="inline-flex rounded-md bg-tide-600 px-4 py-2 text-sm font-medium text-white hover:bg-tide-700"
        >
          Sign in to save this sizing
        </Link>
        <Link
          href={`/sign-up?next=${encodeURIComponent(nextPath)}`}
          className="text-sm text-tide-700 underline"
          data-testid="create-account-to-save"
        >
          Create an account
        </Link>
      </div>
      <p className="mt-2 text-hint text-ink-muted">
        Your inputs come back with you after signing in or creating an account.
      </p>
    </section>
  );
}
