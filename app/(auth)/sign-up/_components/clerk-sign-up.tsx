'use client';

import { SignUp } from '@clerk/nextjs';

/** Clerk's sign-up component, shown on Dutywise's own page when Clerk is configured. */
export function ClerkSignUp() {
  return (
    <div className="mt-6">
      <SignUp routing="hash" forceRedirectUrl="/size" signInUrl="/sign-in" />
    </div>
  );
}
