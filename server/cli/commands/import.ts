import path from 'node:path';
import { importDxf, importSvg } from '../../../geometry/index.ts';
import { CliError, parseOptions, readText, writeJson } from '../io.ts';
import type { Command } from '../command.ts';

export const importCommand: Command = {
  name: 'import',
  summary: 'read an SVG or ASTM D6673 DXF pattern file into a Blockwright pattern (JSON)',
  usage: [
    'Usage: npx blockwright import FILE.svg|FILE.dxf [--out pattern.json]',
    '',
    'SVG: units come from the file\'s width/height and viewBox; pieces and sizes from',
    'data-piece/data-size/data-role/data-name attributes, group ids or labels, or automatic',
    'grouping of nested outlines.',
    'DXF (ASTM D6673): one block per piece and size; boundary, turn points, notches, grain,',
    'fold and internal lines by layer; Units: ENGLISH or METRIC from the style text.',
    'Notes about guesses go to standard error.',
  ].join('\n'),
  async run(args, io) {
    const { values, positionals } = parseOptions(args, { out: { type: 'string' } });
    const [file] = positionals;
    if (!file || positionals.length > 1) throw new CliError('give one input file: npx blockwright import FILE');
    const ext = path.extname(file).toLowerCase();
    if (ext !== '.svg' && ext !== '.dxf')
      throw new CliError(`cannot import ${ext || 'a file without extension'}: use an .svg or .dxf file`);
    const text = readText(file);
    const result = ext === '.svg' ? importSvg(text) : { ...importDxf(text), skipped: [] };
    for (const note of result.notes) io.stderr.write(`note: ${note}\n`);
    if (result.skipped.length > 0) io.stderr.write(`note: not imported: ${result.skipped.join(', ')}\n`);
    writeJson(result.pattern, values.out, io.stdout);
    return 0;
  },
};
