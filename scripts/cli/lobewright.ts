// Entry point of scripts/lobewright: reads one JSON request from stdin, dispatches, writes one JSON answer.
import { readFileSync } from 'node:fs';
import { CliError, type CliCommand } from './cli-error';

const commands: Record<string, () => Promise<{ default: CliCommand }>> = {
  eval: () => import('./commands/eval'),
  radial: () => import('./commands/radial'),
  ylm: () => import('./commands/ylm'),
  props: () => import('./commands/props'),
  isosurface: () => import('./commands/isosurface'),
  solve: () => import('./commands/solve'),
  render: () => import('./commands/render'),
};

function fail(field: string, message: string, code = 'bad_request'): never {
  process.stdout.write(JSON.stringify({ error: { code, field, message } }) + '\n');
  process.exit(2);
}

async function main(): Promise<void> {
  const name = process.argv[2];
  if (!name || !(name in commands)) {
    fail('command', `unknown command "${name ?? ''}"; expected one of: ${Object.keys(commands).join(', ')}`);
  }
  let request: unknown;
  try {
    request = JSON.parse(readFileSync(0, 'utf8'));
  } catch (err) {
    fail('request', `standard input is not valid JSON: ${(err as Error).message}`, 'malformed_json');
  }
  const command = (await commands[name]()).default;
  try {
    const answer = await command(request);
    // A command may answer with file bytes (render without "out"): they go to stdout as they are.
    if (answer instanceof Uint8Array) process.stdout.write(answer);
    else process.stdout.write(JSON.stringify(answer) + '\n');
  } catch (err) {
    if (err instanceof CliError) fail(err.field, err.message, err.code);
    throw err;
  }
}

void main();
