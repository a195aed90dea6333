import fs from 'node:fs';
import path from 'node:path';
import { parseArgs, type ParseArgsConfig } from 'node:util';

/** The largest file the command line reads (pattern files are far smaller). */
export const MAX_INPUT_BYTES = 20 * 1024 * 1024;

export class CliError extends Error {}

export function readText(file: string): string {
  let stat: fs.Stats;
  try {
    stat = fs.statSync(file);
  } catch {
    throw new CliError(`cannot read ${file}: no such file`);
  }
  if (!stat.isFile()) throw new CliError(`${file} is not a file`);
  if (stat.size > MAX_INPUT_BYTES) throw new CliError(`${file} is larger than ${MAX_INPUT_BYTES / 1024 / 1024} MB`);
  return fs.readFileSync(file, 'utf8');
}

export function readJson(file: string): unknown {
  const text = readText(file);
  try {
    return JSON.parse(text) as unknown;
  } catch (e) {
    throw new CliError(`${file} is not valid JSON: ${e instanceof Error ? e.message : String(e)}`);
  }
}

/** JSON to `--out FILE` when given, else to standard output. */
export function writeJson(value: unknown, out: string | undefined, stdout: NodeJS.WritableStream): void {
  const text = `${JSON.stringify(value, null, 2)}\n`;
  if (out) {
    fs.mkdirSync(path.dirname(path.resolve(out)), { recursive: true });
    fs.writeFileSync(out, text);
  } else {
    stdout.write(text);
  }
}

/** node:util parseArgs with strict options; a wrong option is a CliError with one line. */
export function parseOptions<T extends NonNullable<ParseArgsConfig['options']>>(args: string[], options: T) {
  try {
    return parseArgs({ args, options, allowPositionals: true, strict: true });
  } catch (e) {
    throw new CliError(e instanceof Error ? e.message.split('\n')[0]! : String(e));
  }
}
