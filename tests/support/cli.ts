import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll } from 'vitest';
import { projectRoot } from '../../server/config.ts';

/** The command line's bin file, run as a real process. */
export const BIN = path.join(projectRoot, 'server/cli/blockwright.mjs');

/**
 * For a command-line test file: a scratch folder (removed after the file), `cli(...args)` running
 * `blockwright` in it, and `write(name, value)` putting a file there (JSON unless a string).
 */
export function cliScratch(prefix: string) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), prefix));
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));
  const cli = (...args: string[]) => {
    const res = spawnSync(process.execPath, [BIN, ...args], { cwd: dir, encoding: 'utf8' });
    return { status: res.status, stdout: res.stdout, stderr: res.stderr };
  };
  const write = (name: string, value: unknown): string => {
    const file = path.join(dir, name);
    fs.writeFileSync(file, typeof value === 'string' ? value : JSON.stringify(value));
    return file;
  };
  return { dir, cli, write };
}
