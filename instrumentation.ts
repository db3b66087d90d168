// Runs once when the server starts: a production start with development settings stops here, with one line per
// problem (lib/security/production-check.ts).
export async function register() {
  // eslint-disable-next-line no-restricted-properties
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { refuseUnsafeStart } = await import('./lib/security/start-check');
  await refuseUnsafeStart({ server: true });
}
