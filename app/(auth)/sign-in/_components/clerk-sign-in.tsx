'use client';

import dynamic from 'next/dynamic';

// Loaded only when Clerk is the identity: the local sign-in page never ships Clerk's components.
const SignIn = dynamic(() => import('@clerk/nextjs').then((m) => m.SignIn));

/** Clerk's sign-in component, shown on Dutywise's own page when Clerk is configured. */
export function ClerkSignIn({ next }: { next: string }) {
  return (
    <div className="mt-6">
      <SignIn routing="hash" forceRedirectUrl={next} signUpUrl="/sign-up" />
    </div>
  );
}
