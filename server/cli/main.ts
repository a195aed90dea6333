import { readFileSync } from 'node:fs';
import path from 'node:path';
import { projectRoot } from '../config.ts';
import type { Command } from './command.ts';
import { alterCommand } from './commands/alter.ts';
import { exportCommand } from './commands/export.ts';
import { importCommand } from './commands/import.ts';
import { measureCommand } from './commands/measure.ts';
import { planCommand } from './commands/plan.ts';

/** Commands register here as the engine, print and planner land. */
const COMMANDS: Command[] = [importCommand, alterCommand, measureCommand, exportCommand, planCommand];

function version(): string {
  const pkg = JSON.parse(readFileSync(path.join(projectRoot, 'package.json'), 'utf8')) as { version: string };
  return pkg.version;
}

function help(): string {
  const lines = [
    'blockwright — fit and alter trouser patterns, print them tiled at home.',
    '',
    'Usage: npx blockwright <command> [options]',
    '',
    'Commands:',
    ...COMMANDS.map((c) => `  ${c.name.padEnd(10)} ${c.summary}`),
    `  ${'help'.padEnd(10)} show this help (also --help, -h)`,
    `  ${'version'.padEnd(10)} print the version (also --version)`,
    '',
    'Lengths in files are millimetres. Without --out, results go to standard output as JSON;',
    'errors go to standard error as one line, with a non-zero exit status.',
  ];
  return lines.join('\n');
}

/** Run the command line; returns the exit status. */
export async function run(
  argv: string[],
  out: NodeJS.WritableStream = process.stdout,
  err: NodeJS.WritableStream = process.stderr,
): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === 'help' || name === '--help' || name === '-h') {
    out.write(`${help()}\n`);
    return name === undefined ? 1 : 0;
  }
  if (name === 'version' || name === '--version') {
    out.write(`${version()}\n`);
    return 0;
  }
  const command = COMMANDS.find((c) => c.name === name);
  if (!command) {
    err.write(`blockwright: unknown command "${name}"; see npx blockwright --help\n`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    out.write(`${command.usage}\n`);
    return 0;
  }
  try {
    return await command.run(rest, { stdout: out, stderr: err });
  } catch (e) {
    err.write(`blockwright ${name}: ${e instanceof Error ? e.message : String(e)}\n`);
    return 1;
  }
}
