import type { NextConfig } from 'next';
import createNextIntlPlugin from 'next-intl/plugin';
import { parseEnv } from './lib/server/env-schema';
import { securityHeaders } from './lib/server/security-headers';

// The build's own configuration: the same schema as the server's (lib/server/env.ts), read here
// because next.config runs outside the React server environment.
const env = parseEnv(process.env);

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
