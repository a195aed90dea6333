// The import worker's entry (see import-runner.ts): TypeScript through tsx, as the command line does.
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

register({ tsconfig: fileURLToPath(new URL('../../../tsconfig.json', import.meta.url)) });
await import('./import-job.ts');
