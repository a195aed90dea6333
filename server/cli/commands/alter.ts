import { z } from 'zod';
import { applyOps, parsePattern } from '../../../geometry/index.ts';
import { CliError, parseOptions, readJson, writeJson } from '../io.ts';
import type { Command } from '../command.ts';

const opsFileSchema = z.object({ ops: z.array(z.unknown()) });

export const alterCommand: Command = {
  name: 'alter',
  summary: 'apply an alteration list to a pattern',
  usage: [
    'Usage: npx blockwright alter pattern.json --ops ops.json [--out out.json]',
    '',
    'ops.json holds { "ops": [ … ] }, applied in order (blend, lengthen, rise, slash-spread,',
    'girth, shrinkage, seam-allowance). The altered pattern is written as JSON; cautions (an',
    'extrapolated size, say) go to standard error.',
  ].join('\n'),
  async run(args, io) {
    const { values, positionals } = parseOptions(args, { ops: { type: 'string' }, out: { type: 'string' } });
    const [file] = positionals;
    if (!file || positionals.length > 1) throw new CliError('give one pattern file: npx blockwright alter pattern.json --ops ops.json');
    if (!values.ops) throw new CliError('--ops FILE is required');
    const pattern = parsePattern(readJson(file));
    const opsFile = opsFileSchema.safeParse(readJson(values.ops));
    if (!opsFile.success) throw new CliError(`${values.ops} must hold { "ops": [ … ] }`);
    // applyOps checks each operation and names the first one it refuses, with its position.
    const result = applyOps(pattern, opsFile.data.ops);
    for (const c of result.cautions) io.stderr.write(`caution (operation ${c.op + 1}): ${c.message}\n`);
    writeJson(result.pattern, values.out, io.stdout);
    return 0;
  },
};
