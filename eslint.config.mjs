import nextConfig from 'eslint-config-next';

const config = [
  { ignores: ['node_modules/**', '.next*/**', '.data/**', '.tmp/**', 'drizzle/**', 'public/**', 'test-results/**', 'playwright-report/**', 'next-env.d.ts'] },
  ...nextConfig,
];

export default config;
