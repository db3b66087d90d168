import type { ReactNode } from 'react';
import { clerkEnabled } from '@/lib/env';

/**
 * Clerk's provider around the page when Clerk is the identity. Whether a build can carry Clerk at all is fixed
 * when it is built (next.config.ts sets DUTYWISE_CLERK_BUILD from NEXT_PUBLIC_CLERK_PUBLISHABLE_KEY): the test
 * below is a constant to the bundler, so a build without Clerk leaves its client provider (about 50 kB gzip)
 * out of every page instead of shipping it unused. A Clerk-configured start of such a build is refused
 * (lib/security/production-check.ts).
 */
export async function IdentityProvider({ children }: { children: ReactNode }) {
  // eslint-disable-next-line no-restricted-properties -- replaced by a literal at build time, see above
  if (process.env.DUTYWISE_CLERK_BUILD === 'on') {
    if (clerkEnabled) {
      const { ClerkProvider } = await import('@clerk/nextjs');
      return <ClerkProvider>{children}</ClerkProvider>;
    }
  }
  return children;
}
