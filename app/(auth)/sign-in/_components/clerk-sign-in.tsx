'use client';

import { SignIn } from '@clerk/nextjs';

/** Clerk's sign-in component, shown on Dutywise's own page when Clerk is configured. */
export function ClerkSignIn({ next }: { next: string }) {
  return (
    <div className="mt-6">
      <SignIn routing="hash" forceRedirectUrl={next} signUpUrl="/sign-up" />
    </div>
  );
}
