/** `npm run bench`: every benchmark, one after the other, in one process. */
import { alterationsBench } from './alterations.ts';
import { printBench } from './print.ts';

await alterationsBench();
await printBench();
