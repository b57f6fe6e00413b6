/**
 * `npm run --silent engine -- <command> < input.json > output.json` (see the engine contract).
 */
import { runEngineCommand } from '../engine-cli/run-command';

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

async function main() {
  const outcome = await runEngineCommand(process.argv[2], await readStdin());
  if (!outcome.ok) {
    process.stderr.write(`${outcome.reason}\n`);
    process.exitCode = outcome.status;
    return;
  }
  process.stdout.write(`${JSON.stringify(outcome.output)}\n`);
}

main().catch((e: unknown) => {
  process.stderr.write(`engine: internal error: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exitCode = 1;
});
