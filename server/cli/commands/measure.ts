import { crotchLength, measurePattern, pairedSeamReport, parsePattern } from '../../../geometry/index.ts';
import { CliError, parseOptions, readJson, writeJson } from '../io.ts';
import type { Command } from '../command.ts';

export const measureCommand: Command = {
  name: 'measure',
  summary: 'measure a pattern: edge lengths, paired seams, crotch length',
  usage: [
    'Usage: npx blockwright measure pattern.json [--out measures.json]',
    '',
    'Prints, in millimetres: the length of each named edge of every piece and size, the',
    'paired-seam report (front against back inseam and side seam, with the difference and',
    'whether it is within tolerance), and the total crotch length per size.',
  ].join('\n'),
  async run(args, io) {
    const { values, positionals } = parseOptions(args, { out: { type: 'string' } });
    const [file] = positionals;
    if (!file || positionals.length > 1) throw new CliError('give one pattern file: npx blockwright measure pattern.json');
    const pattern = parsePattern(readJson(file));
    const names = new Set(pattern.pieces.map((p) => p.name));
    writeJson(
      {
        units: 'mm',
        pieces: measurePattern(pattern),
        pairedSeams: names.has('front') && names.has('back') ? pairedSeamReport(pattern) : [],
        crotchLength: crotchLength(pattern),
      },
      values.out,
      io.stdout,
    );
    return 0;
  },
};
