/**
 * Runs one engine command on a JSON text, as the CLI contract describes: a result on success, or a
 * one-line reason naming the offending field (exit status 2) on bad input. Kept apart from the CLI
 * script so tests can call it without a child process.
 */
import { engineCommands } from './commands';
import { EngineInputError, findNonFinite, formatIssues } from '../lib/engine/validation';

export type CommandOutcome = { ok: true; output: unknown } | { ok: false; status: 2; reason: string };

export async function runEngineCommand(name: string | undefined, inputText: string): Promise<CommandOutcome> {
  const command = name ? engineCommands[name] : undefined;
  if (!command) {
    return { ok: false, status: 2, reason: `command: must be one of ${Object.keys(engineCommands).join(', ')}` };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(inputText);
  } catch (e) {
    return { ok: false, status: 2, reason: `(input): not valid JSON (${(e as Error).message})` };
  }
  const parsed = command.schema.safeParse(raw);
  if (!parsed.success) return { ok: false, status: 2, reason: formatIssues(parsed.error)[0] ?? '(input): invalid' };
  try {
    const output = await command.run(parsed.data);
    const bad = findNonFinite(output);
    // A non-finite number in the output is an engine defect, not bad input: fail loudly.
    if (bad) throw new Error(`engine produced a non-finite number at ${bad}`);
    return { ok: true, output };
  } catch (e) {
    if (e instanceof EngineInputError) return { ok: false, status: 2, reason: e.message };
    throw e;
  }
}
