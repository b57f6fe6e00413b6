import type { NextConfig } from 'next';
import createNextIntlPlugin from 'next-intl/plugin';

const withNextIntl = createNextIntlPlugin('./lib/i18n/request.ts');

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // The engine runs in worker threads from route handlers; keep tsx out of the bundle.
  serverExternalPackages: [],
};

export default withNextIntl(nextConfig);
