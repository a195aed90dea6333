import fs from 'node:fs';
import path from 'node:path';
import { parsePattern } from '../../../geometry/index.ts';
import { PAPER_IDS } from '../../../geometry/index.ts';
import { printPattern } from '../../modules/print/print.service.ts';
import { CliError, parseOptions, readJson } from '../io.ts';
import type { Command } from '../command.ts';

function mm(name: string, value: string | undefined): number | undefined {
  if (value === undefined) return undefined;
  const v = Number(value);
  if (value.trim() === '' || !Number.isFinite(v)) throw new CliError(`--${name} must be a number of millimetres, got "${value}"`);
  return v;
}

export const exportCommand: Command = {
  name: 'export',
  summary: 'print a pattern: tiled or large-format PDF, or a true-scale SVG',
  usage: [
    'Usage: npx blockwright export pattern.json --format pdf|svg [--paper PAPER] [--orientation auto|portrait|landscape]',
    '         [--overlap MM] [--margin MM] [--size S] [--rotate] [--title TEXT] [--date YYYY-MM-DD] [--out FILE]',
    '',
    `PAPER: ${PAPER_IDS.join(', ')} (default letter). letter … a3 print tiled on home-printer`,
    'pages (page 1: test squares and the assembly map); a0 and the rolls print one sheet.',
    '--margin is the non-printable margin (default 6.35 mm); --overlap the band neighbouring pages',
    'share (default 0: trim and butt). --size picks a size line when pieces are not blended;',
    '--rotate lets pieces lie with the grain across the page.',
    'The file goes to --out; without it, an SVG goes to standard output, and a PDF only when',
    'standard output is not a terminal. Pages left out (no pattern on them) are listed on',
    'standard error. Print at 100 % and measure the test squares before cutting.',
  ].join('\n'),
  async run(args, io) {
    const { values, positionals } = parseOptions(args, {
      format: { type: 'string' },
      paper: { type: 'string' },
      orientation: { type: 'string' },
      overlap: { type: 'string' },
      margin: { type: 'string' },
      size: { type: 'string' },
      rotate: { type: 'boolean' },
      title: { type: 'string' },
      date: { type: 'string' },
      out: { type: 'string' },
    });
    const [file] = positionals;
    if (!file || positionals.length > 1) throw new CliError('give one pattern file: npx blockwright export pattern.json --format pdf --out pattern.pdf');
    const format = values.format ?? 'pdf';
    if (format !== 'pdf' && format !== 'svg') throw new CliError(`--format must be pdf or svg, got "${format}"`);
    const stdout = io.stdout as NodeJS.WritableStream & { isTTY?: boolean };
    if (format === 'pdf' && !values.out && stdout.isTTY) throw new CliError('a PDF is binary: give --out FILE (or redirect standard output)');
    const pattern = parsePattern(readJson(file));
    const result = await printPattern(pattern, {
      format,
      paper: values.paper as never,
      orientation: values.orientation as never,
      overlap: mm('overlap', values.overlap),
      margin: mm('margin', values.margin),
      size: values.size,
      allowRotate90: values.rotate ?? false,
      title: values.title,
      date: values.date,
    });
    if (values.out) {
      fs.mkdirSync(path.dirname(path.resolve(values.out)), { recursive: true });
      fs.writeFileSync(values.out, result.data);
    } else {
      stdout.write(result.data);
    }
    const plan = result.plan;
    const where = values.out ?? 'standard output';
    if (result.format === 'svg') {
      io.stderr.write(`true-scale SVG, one sheet (1 unit = 1 mm) to ${where}\n`);
    } else if (plan.format === 'tiled') {
      io.stderr.write(`${plan.pageCount} pages (${plan.paper.label}, ${plan.grid.orientation}; grid ${plan.grid.rows} × ${plan.grid.cols}) to ${where}\n`);
      io.stderr.write(result.emptyPages.length ? `left out, no pattern on them: ${result.emptyPages.join(', ')}\n` : 'no page left out\n');
    } else {
      io.stderr.write(`1 sheet ${Math.round(plan.sheet.width)} × ${Math.round(plan.sheet.height)} mm (${plan.paper.label}) to ${where}\n`);
    }
    io.stderr.write('print at 100 % (actual size) and measure the test squares before cutting\n');
    return 0;
  },
};
