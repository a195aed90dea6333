/** `npm run bench`: every benchmark, one after the other, in one process. */
import { alterationsBench } from './alterations.ts';
import { printBench } from './print.ts';
import { workspaceDragBench } from './workspace-drag.ts';

await alterationsBench();
await printBench();
await workspaceDragBench();
