import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { headers } from 'next/headers';
import { plexMono, plexSans } from './fonts';
import { IdentityProvider } from './_components/identity-provider';
import { Providers } from './_components/providers';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Dutywise', template: '%s · Dutywise' },
  description: 'Heater duty and compressor power sizing desk for process gas equipment quotes.',
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Reading the request renders every page per request, which the per-request script nonce (middleware.ts) needs:
  // a page prerendered at build time would carry scripts without it.
  await headers();
  return (
    <IdentityProvider>
      <html lang="en" className={`${plexSans.variable} ${plexMono.variable}`}>
        <body className="min-h-screen">
          <Providers>{children}</Providers>
        </body>
      </html>
    </IdentityProvider>
  );
}
