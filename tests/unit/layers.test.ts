/**
 * The layer rules in eslint.config.mjs catch a wrong import and say where the code belongs, and the
 * cycle check catches a cycle. Each case lints a deliberately wrong file with the project's own
 * configuration, so a rule that stopped firing fails here.
 */
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { ESLint } from 'eslint';
import { afterAll, describe, expect, it } from 'vitest';

const ROOT = process.cwd();
// The cycle rule reads the imported files from disk, so it cannot run on text that is not a file; the
// layer cases lint text without it, the cycle case lints real files.
const eslint = new ESLint({ cwd: ROOT, overrideConfig: { rules: { 'import/no-cycle': 'off' } } });

async function messagesFor(code: string, filePath: string): Promise<{ ruleId: string | null; message: string }[]> {
  const [result] = await eslint.lintText(code, { filePath: path.join(ROOT, filePath) });
  return result.messages.map((m) => ({ ruleId: m.ruleId, message: m.message }));
}

const RESTRICTED = '@typescript-eslint/no-restricted-imports';

describe('layer rules', () => {
  it.each([
    ['a component importing a route file', "import { x } from '@/app/(workspace)/layout';\nexport const y = x;\n", 'components/probe/bad.tsx', /app\/ holds routes/],
    ['a component importing the data layer', "import { getActor } from '@/lib/data/session';\nexport const y = getActor;\n", 'components/probe/bad.tsx', /components\/ are client leaves/],
    ['a page importing the database', "import { db } from '@/db/client';\nexport const y = db;\n", 'app/probe/page.tsx', /Only lib\/data/],
    ['a page importing an engine module', "import { thawDepthStefan } from '@/lib/engine/stefan';\nexport const y = thawDepthStefan;\n", 'app/probe/page.tsx', /public interface/],
    ['a server action importing the database', "import { users } from '@/db/schema';\nexport const y = users;\n", 'lib/actions/probe.ts', /Only lib\/data/],
    ['a client-safe helper importing server code', "import { env } from '@/lib/server/env';\nexport const y = env;\n", 'lib/outlook/probe.ts', /client-safe/],
    ['a core operation asking the session', "import { getActor } from '@/lib/data/session';\nexport const y = getActor;\n", 'lib/data/core/probe.ts', /explicit context/],
    ['the engine importing React', "import { useState } from 'react';\nexport const y = useState;\n", 'lib/engine/probe.ts', /pure TypeScript/],
    ['the engine importing the application', "import { env } from '@/lib/server/env';\nexport const y = env;\n", 'lib/engine/probe.ts', /pure TypeScript/],
  ])('refuses %s', async (_what, code, file, message) => {
    const found = (await messagesFor(code, file)).filter((m) => m.ruleId === RESTRICTED);
    expect(found).toHaveLength(1);
    expect(found[0].message).toMatch(message);
  });

  it.each([
    ['a page using the engine through its interface', "import { ENGINE_VERSION } from '@/lib/engine';\nexport const y = ENGINE_VERSION;\n", 'app/probe/page.tsx'],
    ['a component importing a server action', "import { setLocaleAction } from '@/lib/actions/preferences';\nexport const y = setLocaleAction;\n", 'components/probe/ok.tsx'],
    ['a component importing a type of the server', "import type { ActionResult } from '@/lib/server/validated-action';\nexport type Y = ActionResult;\n", 'components/probe/ok.tsx'],
  ])('allows %s', async (_what, code, file) => {
    expect((await messagesFor(code, file)).filter((m) => m.ruleId === RESTRICTED)).toEqual([]);
  });
});

describe('cycle check', () => {
  const dir = path.join(ROOT, 'lib', `cycle-probe-${process.pid}`);
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('refuses two modules that import each other', async () => {
    mkdirSync(dir, { recursive: true });
    const a = "import { b } from './b';\nexport const a = () => b();\n";
    const b = "import { a } from './a';\nexport const b = () => a;\n";
    writeFileSync(path.join(dir, 'a.ts'), a);
    writeFileSync(path.join(dir, 'b.ts'), b);
    const [result] = await new ESLint({ cwd: ROOT }).lintFiles([path.join(dir, 'a.ts')]);
    const found = result.messages.filter((m) => m.ruleId === 'import/no-cycle');
    expect(found).toHaveLength(1);
    expect(found[0].message).toMatch(/cycle/i);
  });
});
