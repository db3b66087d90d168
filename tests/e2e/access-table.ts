// Who may reach each page and route handler: the specification the matrix journey holds the app to.
// Placeholders (:name) are filled from the seeded demo scenario. Every page.tsx and route.ts under app/
// needs at least one row; a new route without one fails the matrix.
export type Who = 'anon' | 'sales_engineer' | 'customer' | 'support' | 'admin';
export type Outcome = 'ok' | 'sign-in' | 'no-access' | 'not-found' | number;
export type AccessRow = {
  file: string;
  path: string;
  method?: 'GET' | 'POST';
  body?: unknown;
  expect: Record<Who, Outcome>;
};

const all = (o: Outcome): Record<Who, Outcome> => ({ anon: o, sales_engineer: o, customer: o, support: o, admin: o });
const signedIn = (o: Outcome, anon: Outcome = 'sign-in'): Record<Who, Outcome> => ({ ...all(o), anon });
const writers: Record<Who, Outcome> = {
  anon: 'sign-in',
  sales_engineer: 'ok',
  customer: 'no-access',
  support: 'no-access',
  admin: 'ok',
};

// The signed-in customer is Olu Bennet of Tarnside Polymers; Greyfen rows belong to another account.
export const accessTable: AccessRow[] = [
  { file: 'app/(marketing)/page.tsx', path: '/', expect: all('ok') },
  { file: 'app/(marketing)/pricing/page.tsx', path: '/pricing', expect: all('ok') },
  { file: 'app/(auth)/sign-in/page.tsx', path: '/sign-in', expect: all('ok') },
  { file: 'app/(auth)/sign-up/page.tsx', path: '/sign-up', expect: all('ok') },
  { file: 'app/(auth)/invite/[token]/page.tsx', path: '/invite/not-a-real-token-000000000000', expect: all('ok') },
  { file: 'app/(auth)/verify/[token]/page.tsx', path: '/verify/not-a-real-token-00000000000000', expect: all('ok') },
  { file: 'app/(auth)/forgot-password/page.tsx', path: '/forgot-password', expect: all('ok') },
  {
    file: 'app/(auth)/reset-password/[token]/page.tsx',
    path: '/reset-password/not-a-real-token-00000000000000',
    expect: all('ok'),
  },
  { file: 'app/(desk)/no-access/page.tsx', path: '/no-access', expect: all('ok') },
  // Sign-in's default destination: each role is sent on to its own home.
  { file: 'app/(desk)/home/page.tsx', path: '/home', expect: signedIn(307) },
  { file: 'app/(desk)/size/page.tsx', path: '/size', expect: all('ok') },
  {
    file: 'app/(desk)/size/page.tsx',
    path: '/size?sizing=:greyfenSizing',
    expect: { anon: 'ok', sales_engineer: 'ok', customer: 'ok', support: 'ok', admin: 'ok' },
  },
  { file: 'app/(desk)/sizings/page.tsx', path: '/sizings', expect: signedIn('ok') },
  { file: 'app/(desk)/sizings/[sizingId]/page.tsx', path: '/sizings/:tarnsideSizing', expect: signedIn('ok') },
  {
    file: 'app/(desk)/sizings/[sizingId]/page.tsx',
    path: '/sizings/:greyfenSizing',
    expect: { ...signedIn('ok'), customer: 'not-found' },
  },
  { file: 'app/(desk)/sizings/[sizingId]/page.tsx', path: '/sizings/not-a-uuid', expect: signedIn('not-found') },
  { file: 'app/(desk)/quotes/page.tsx', path: '/quotes', expect: signedIn('ok') },
  { file: 'app/(desk)/quotes/new/page.tsx', path: '/quotes/new', expect: writers },
  { file: 'app/(desk)/quotes/[quoteId]/page.tsx', path: '/quotes/:tarnsideQuote', expect: signedIn('ok') },
  {
    file: 'app/(desk)/quotes/[quoteId]/page.tsx',
    path: '/quotes/:greyfenQuote',
    expect: { ...signedIn('ok'), customer: 'not-found' },
  },
  { file: 'app/(desk)/accounts/page.tsx', path: '/accounts', expect: signedIn('ok') },
  { file: 'app/(desk)/accounts/new/page.tsx', path: '/accounts/new', expect: writers },
  { file: 'app/(desk)/accounts/[accountId]/page.tsx', path: '/accounts/:tarnsideAccount', expect: signedIn('ok') },
  {
    file: 'app/(desk)/accounts/[accountId]/page.tsx',
    path: '/accounts/:greyfenAccount',
    expect: { ...signedIn('ok'), customer: 'not-found' },
  },
  { file: 'app/(desk)/datasheets/page.tsx', path: '/datasheets', expect: signedIn('ok') },
  {
    file: 'app/(desk)/support/page.tsx',
    path: '/support',
    expect: { anon: 'sign-in', sales_engineer: 'ok', customer: 'no-access', support: 'ok', admin: 'ok' },
  },
  {
    file: 'app/(desk)/support/audit/page.tsx',
    path: '/support/audit',
    expect: { anon: 'sign-in', sales_engineer: 'no-access', customer: 'no-access', support: 'ok', admin: 'ok' },
  },
  {
    file: 'app/(desk)/mail/page.tsx',
    path: '/mail',
    expect: { anon: 'sign-in', sales_engineer: 'no-access', customer: 'no-access', support: 'ok', admin: 'ok' },
  },
  {
    file: 'app/(desk)/billing/page.tsx',
    path: '/billing',
    expect: { anon: 'sign-in', sales_engineer: 'no-access', customer: 'ok', support: 'no-access', admin: 'no-access' },
  },
  {
    file: 'app/(desk)/admin/page.tsx',
    path: '/admin',
    expect: { anon: 'sign-in', sales_engineer: 'no-access', customer: 'no-access', support: 'no-access', admin: 'ok' },
  },
  { file: 'app/(desk)/api-keys/page.tsx', path: '/api-keys', expect: signedIn('ok') },
  {
    file: 'app/(desk)/batch/page.tsx',
    path: '/batch',
    expect: { anon: 'sign-in', sales_engineer: 'ok', customer: 'ok', support: 'no-access', admin: 'ok' },
  },

  { file: 'app/api/health/route.ts', path: '/api/health', expect: all(200) },
  { file: 'app/api/ready/route.ts', path: '/api/ready', expect: all(200) },
  {
    file: 'app/api/auth/sign-in/route.ts',
    path: '/api/auth/sign-in',
    method: 'POST',
    body: { email: 'nobody@nowhere.example', password: 'x' },
    expect: all(401),
  },
  {
    file: 'app/api/v1/calculate/route.ts',
    path: '/api/v1/calculate',
    method: 'POST',
    body: { service: 'heater' },
    expect: all(400),
  },
  { file: 'app/api/v1/openapi/route.ts', path: '/api/v1/openapi', expect: all(200) },
  { file: 'app/api/v1/batch/template/route.ts', path: '/api/v1/batch/template', expect: all(200) },
  {
    file: 'app/api/v1/batch/preview/route.ts',
    path: '/api/v1/batch/preview',
    method: 'POST',
    // The scenario's customer has no subscription: batch upload is a subscriber's (402 before the body is read).
    expect: { anon: 401, sales_engineer: 400, customer: 402, support: 403, admin: 400 },
  },
  {
    file: 'app/api/v1/batch/commit/route.ts',
    path: '/api/v1/batch/commit',
    method: 'POST',
    // The scenario's customer has no subscription: batch upload is a subscriber's (402 before the body is read).
    expect: { anon: 401, sales_engineer: 400, customer: 402, support: 403, admin: 400 },
  },
  {
    file: 'app/api/v1/billing/status/route.ts',
    path: '/api/v1/billing/status',
    expect: { anon: 401, sales_engineer: 403, customer: 200, support: 403, admin: 403 },
  },
  {
    file: 'app/api/v1/support/search/route.ts',
    path: '/api/v1/support/search?q=EH-301',
    expect: { anon: 401, sales_engineer: 200, customer: 403, support: 200, admin: 200 },
  },
  {
    file: 'app/api/v1/support/export/route.ts',
    path: '/api/v1/support/export?q=EH-301',
    expect: { anon: 401, sales_engineer: 200, customer: 403, support: 200, admin: 200 },
  },
  {
    file: 'app/api/v1/datasheets/[revisionId]/route.ts',
    path: '/api/v1/datasheets/:greyfenRevision',
    expect: { anon: 401, sales_engineer: 200, customer: 404, support: 200, admin: 200 },
  },
  {
    file: 'app/api/v1/datasheets/[revisionId]/route.ts',
    path: '/api/v1/datasheets/:tarnsideRevision',
    expect: { anon: 401, sales_engineer: 200, customer: 402, support: 200, admin: 200 },
  },
  {
    // The demo holds no bound quote PDF: an unknown edition is not found for everyone signed in.
    file: 'app/api/v1/quote-documents/[documentId]/route.ts',
    path: '/api/v1/quote-documents/00000000-0000-4000-8000-000000000000',
    expect: { anon: 401, sales_engineer: 404, customer: 404, support: 404, admin: 404 },
  },
  {
    file: 'app/api/webhooks/stripe/route.ts',
    path: '/api/webhooks/stripe',
    method: 'POST',
    body: { id: 'evt_unsigned' },
    expect: all(400),
  },
];
