import nextConfig from 'eslint-config-next';

/**
 * Lint, plus the house's layers as rules: each folder may import only from the layers below it, and
 * no module may take part in an import cycle. A wrong import fails `npm run lint` (and so the test
 * command) with a message that says where the code belongs. DEVELOPERS.md draws the layers.
 */

const ENGINE_INTERNALS = {
  group: ['@/lib/engine/*', '**/lib/engine/*'],
  message: "Use the engine's public interface: import from '@/lib/engine' (lib/engine/index.ts); add an export there if something is missing.",
};
const DATABASE = {
  group: ['@/db', '@/db/*', '**/db/client', '**/db/connect', '**/db/schema', '**/db/schema/*', 'drizzle-orm', 'drizzle-orm/*', 'mysql2', 'mysql2/*'],
  message: 'Only lib/data (which checks the session and role) and db/ touch the database: call a lib/data function instead.',
};
const APP = {
  group: ['@/app/*', '**/app/*'],
  message: 'app/ holds routes, which are leaves: move shared code to lib/ (server actions to lib/actions/, client pieces to components/).',
};
const SERVER_ONLY_LAYERS = {
  group: ['@/lib/data', '@/lib/data/*', '@/lib/server/*', '@/lib/auth/*', '@/lib/mail/*', '@/lib/jobs/*', '@/db', '@/db/*', 'server-only'],
  message: 'This folder is client-safe: it must not import server-only code (lib/data, lib/server, lib/auth, lib/mail, lib/jobs, db).',
};

const SESSION = {
  group: ['@/lib/data/session', '**/data/session', '../session', './session'],
  message: 'Core operations (lib/data/core), auth and jobs run before or without a signed-in request: take the organisation and person as an explicit context instead of asking the session.',
};

/**
 * One no-restricted-imports rule per folder (the globs do not overlap: a later rule for the same file
 * would replace an earlier one); type-only imports are allowed (they vanish at build).
 */
function restrict(files, patterns, paths = []) {
  return {
    files,
    rules: {
      '@typescript-eslint/no-restricted-imports': ['error', { patterns: patterns.map((p) => ({ ...p, allowTypeImports: true })), paths: paths.map((p) => ({ ...p, allowTypeImports: true })) }],
    },
  };
}

const config = [
  { ignores: ['node_modules/**', '.next*/**', '.data/**', '.tmp/**', 'drizzle/**', 'public/**', 'test-results/**', 'playwright-report/**', 'reports/**', 'next-env.d.ts'] },
  ...nextConfig,
  {
    files: ['**/*.{ts,tsx,mts,cts,js,mjs}'],
    rules: {
      // Cycles make module start-up order matter and hide layering mistakes.
      'import/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
  restrict(['app/**'], [DATABASE, ENGINE_INTERNALS]),
  restrict(['components/**'], [
    APP,
    DATABASE,
    ENGINE_INTERNALS,
    {
      group: ['@/lib/data', '@/lib/data/*', '@/lib/server/*', '@/lib/auth/*', '@/lib/mail/*', '@/lib/jobs/*', 'server-only'],
      message: 'components/ are client leaves: take data as props from a page, server actions from lib/actions/, and fetch JSON through lib/api-client.',
    },
  ]),
  restrict(['lib/actions/**'], [APP, DATABASE, ENGINE_INTERNALS]),
  restrict(['lib/outlook/**', 'lib/schemas/**', 'lib/i18n/config.ts', 'lib/api-client/**'], [APP, ENGINE_INTERNALS, SERVER_ONLY_LAYERS]),
  restrict(['lib/data/core/**', 'lib/auth/**', 'lib/jobs/**'], [APP, ENGINE_INTERNALS, SESSION]),
  { ...restrict(['lib/data/**', 'lib/server/**', 'lib/mail/**', 'lib/demo/**', 'db/**'], [APP, ENGINE_INTERNALS]), ignores: ['lib/data/core/**'] },
  restrict(
    ['lib/engine/**'],
    [
      {
        group: ['next', 'next/*', 'react', 'react/*', 'react-dom', 'react-dom/*', '@/*', '**/db/*', 'drizzle-orm', 'drizzle-orm/*', 'mysql2', 'mysql2/*', 'node:http', 'node:https', 'node:net', 'http', 'https', 'net'],
        message: 'lib/engine is pure TypeScript: no framework, database, network or application imports (only its own modules, zod and the standard library).',
      },
    ],
  ),
];

export default config;
