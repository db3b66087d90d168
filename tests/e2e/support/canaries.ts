// Recognisable secret values the test run gives the server (tests/run.sh exports them for the build and
// the server); the bundle scan fails if any of them appears in what the browser downloads.
export const secretCanaries = {
  SESSION_SECRET: 'canary-session-secret-7f31c9a2d4e6b8f0a1c3e5d7',
  STRIPE_SECRET_KEY: 'sk_test_canary_5b9e1d3f7a2c4e6f',
  STRIPE_WEBHOOK_SECRET: 'whsec_canary_8d2f4a6c1e3b5d7f',
  SMTP_PASSWORD: 'canary-smtp-password-3e5a7c9b',
} as const;
