'use client';

import dynamic from 'next/dynamic';

// Loaded only when Clerk is the identity: the local sign-up page never ships Clerk's components.
const SignUp = dynamic(() => import('@clerk/nextjs').then((m) => m.SignUp));

/** Clerk's sign-up component, shown on Dutywise's own page when Clerk is configured. */
export function ClerkSignUp() {
  return (
    <div className="mt-6">
      <SignUp routing="hash" forceRedirectUrl="/size" signInUrl="/sign-in" />
    </div>
  );
}
