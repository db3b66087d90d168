import type { NextConfig } from 'next';

const nextConfig: NextConfig = {
  // Tests build into their own folder so they never overwrite the demo's build.
  distDir: process.env.NEXT_DIST_DIR ?? '.next',
  poweredByHeader: false,
  reactStrictMode: true,
  // The local fakes and the database are separate processes; nothing here downloads at build time.
  serverExternalPackages: ['pg', 'pino', 'nodemailer', '@react-pdf/renderer', 'bcryptjs'],
  eslint: { dirs: ['app', 'lib', 'db', 'emails', 'mocks', 'tests'] },
};

export default nextConfig;
