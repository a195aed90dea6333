#!/usr/bin/env node
// The `blockwright` command (npx blockwright). Runs the TypeScript command line through tsx.
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

register({ tsconfig: fileURLToPath(new URL('../../tsconfig.json', import.meta.url)) });
const { run } = await import('./main.ts');
process.exitCode = await run(process.argv.slice(2));
