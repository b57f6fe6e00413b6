import type { NextConfig } from 'next';
import createNextIntlPlugin from 'next-intl/plugin';
import { env } from './lib/env';
import { securityHeaders } from './lib/security-headers';

const withNextIntl = createNextIntlPlugin('./lib/i18n/request.ts');

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  distDir: env.NEXT_DIST_DIR,
  // forbidden() answers 403 from the data layer (lib/data/session.ts).
  experimental: { authInterrupts: true },
  async headers() {
    return [{ source: '/:path*', headers: securityHeaders(env.NODE_ENV === 'development') }];
  },
};

export default withNextIntl(nextConfig);
