/**
 * `npx blockwright plan`, run as a real process through its bin file.
 * The bodies and tables are invented for the tests.
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { EASE_DEFAULTS, MM_PER_INCH, applyOps, demoPattern, parsePattern, type FitPlan } from '../../geometry/index.ts';
import { cliScratch } from '../support/cli.ts';

const { dir, cli, write } = cliScratch('blockwright-plan-');

const chart = {
  sizes: [0, 2, 4, 6, 8, 10, 12].map((s) => ({ size: String(s), garment: { waist: 700 + 20 * s, hip: 950 + 20 * s, thigh: 560 + 10 * s, calf: 360 + 5 * s } })),
};
const ease = EASE_DEFAULTS.regular;

describe('npx blockwright plan', () => {
  it('when given a profile and the demo pattern, then it prints the plan as JSON whose ops apply to the pattern', () => {
    const pattern = write('demo.json', demoPattern());
    // the stored profile shape of the server ({ name, measurements }) is read as it is
    const profile = write('profile.json', { name: 'invented sewist', measurements: { waistGirth: 760, hipGirth: 1010, thighGirth: 610, bodyRise: 272, insideLegLength: 770 } });
    const res = cli('plan', '--profile', profile, '--pattern', pattern);
    expect(res.status, res.stderr).toBe(0);
    const plan = JSON.parse(res.stdout) as FitPlan;
    expect(plan.units).toBe('mm');
    expect(plan.levels.map((l) => l.level)).toEqual(['waist', 'hip', 'thigh']);
    expect(plan.ops.map((o) => o.op)).toEqual(['blend', 'rise', 'lengthen', 'lengthen']);
    expect(plan.chart.source).toBe('geometry');
    expect(plan.cautions.join('\n')).toMatch(/guidance, not a guarantee of fit/);
    // the ops are ready for `alter`: they apply to the pattern
    expect(() => applyOps(parsePattern(demoPattern()), plan.ops)).not.toThrow();
  });

  it('when the last make\'s note says ½ in too tight at the hip, then the hip gets ½ in more ease and a bad note is one clear line', () => {
    const profile = write('noted.json', { waistGirth: 720, hipGirth: 960 });
    const table = write('chart-n.json', chart);
    const plain = JSON.parse(cli('plan', '--profile', profile, '--chart', table).stdout) as FitPlan;
    const res = cli('plan', '--profile', profile, '--chart', table, '--notes', write('note.json', { levels: { hip: { verdict: 'tight', amount: MM_PER_INCH / 2 } }, nextTime: 'roomier seat' }));
    expect(res.status, res.stderr).toBe(0);
    const noted = JSON.parse(res.stdout) as FitPlan;
    const hip = (p: FitPlan) => p.levels.find((l) => l.level === 'hip')!;
    expect(hip(noted).ease - hip(plain).ease).toBeCloseTo(MM_PER_INCH / 2, 9);
    expect(noted.cautions.join('\n')).toMatch(/roomier seat/);
    const bad = cli('plan', '--profile', profile, '--chart', table, '--notes', write('bad-note.json', { levels: { hip: { verdict: 'snug' } } }));
    expect(bad.status).not.toBe(0);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    expect(bad.stderr).toMatch(/levels\.hip\.verdict/);
  });

  it('when a chart, a waist offset in inches and a fit are given, then the waist size comes from the girth at that height (issue 6 trade fact; common practice, no source)', () => {
    const profile = write('raised.json', { waistGirth: 740, hipGirth: 990, girthsAtHeights: [{ offset: 2 * MM_PER_INCH, girth: 700 }] });
    const res = cli('plan', '--profile', profile, '--chart', write('chart.json', chart), '--waist-offset', '2in', '--fit', 'close', '--out', path.join(dir, 'plan.json'));
    expect(res.status, res.stderr).toBe(0);
    expect(res.stdout).toBe('');
    const plan = JSON.parse(fs.readFileSync(path.join(dir, 'plan.json'), 'utf8')) as FitPlan;
    const waist = plan.levels.find((l) => l.level === 'waist')!;
    expect(waist.body).toBe(700);
    expect(waist.offset).toBeCloseTo(50.8, 9);
    expect(Number(waist.size)).toBeCloseTo(Math.round(((700 + EASE_DEFAULTS.close.waist.mm - 700) / 20) * 10) / 10, 9);
    expect(plan.fit).toBe('close');
  });

  it('when size 0 is chosen at the waist and it is 1 in small, then rigid denim gets a girth change and 18 % stretch denim none (issue 6 trade fact; common practice, no source)', () => {
    const profile = write('tight.json', { waistGirth: 700 + MM_PER_INCH - ease.waist.mm, hipGirth: 990 });
    const table = write('chart3.json', chart);
    const rigid = cli('plan', '--profile', profile, '--chart', table, '--size', 'waist=0', '--fabric', write('rigid.json', { weightOzPerSqYd: 12 }));
    expect(rigid.status, rigid.stderr).toBe(0);
    const r = JSON.parse(rigid.stdout) as FitPlan;
    expect(r.levels.find((l) => l.level === 'waist')!.size).toBe('0');
    expect(r.ops).toContainEqual({ op: 'girth', edge: 'side-seam', level: 'waist', amount: 6.4 });
    expect(r.cautions.join('\n')).toMatch(/uncomfortable/);
    const stretch = cli('plan', '--profile', profile, '--chart', table, '--size', 'waist=0', '--fabric', write('stretch.json', { weightOzPerSqYd: 12, stretchAcross: 18 }));
    expect(stretch.status, stretch.stderr).toBe(0);
    const s = JSON.parse(stretch.stdout) as FitPlan;
    expect(s.levels.find((l) => l.level === 'waist')!.size).toBe('0');
    expect(s.ops.filter((o) => o.op === 'girth')).toEqual([]);
  });

  it('when input is wrong, then a non-zero exit with one clear line on stderr', () => {
    const profile = write('ok.json', { hipGirth: 1000 });
    const chartFile = write('chart2.json', chart);
    const cases: [string[], RegExp][] = [
      [['--profile', profile], /give --pattern FILE or --chart FILE/],
      [['--chart', chartFile], /--profile FILE is required/],
      [['--profile', path.join(dir, 'missing.json'), '--chart', chartFile], /no such file/],
      [['--profile', write('bad-profile.json', { hipGirth: -1 }), '--chart', chartFile], /invalid profile: hipGirth: must be more than 0 mm/],
      [['--profile', profile, '--chart', chartFile, '--fit', 'snug'], /--fit must be one of close, regular, relaxed/],
      [['--profile', profile, '--chart', chartFile, '--waist-offset', 'high'], /--waist-offset must be millimetres or a length with its unit/],
      [['--profile', profile, '--chart', chartFile, '--size', 'ankle=4'], /--size must be LEVEL=SIZE/],
      [['--profile', profile, '--chart', chartFile, '--fabric', write('bad-fabric.json', { weightGsm: 300, weightOzPerSqYd: 12 })], /invalid fabric: weightOzPerSqYd/],
      [['--profile', profile, '--chart', write('bad-chart.json', '{"sizes": [')], /not valid JSON/],
      [['--profile', profile, '--pattern', write('pocket.json', { units: 'mm', pieces: [{ name: 'pocket', outlines: [{ size: '8', d: 'M0 0 L100 0 L100 100 Z' }] }] })], /no leg pieces/],
    ];
    for (const [args, message] of cases) {
      const res = cli('plan', ...args);
      expect(res.status, args.join(' ')).not.toBe(0);
      expect(res.stderr.trim().split('\n'), args.join(' ')).toHaveLength(1);
      expect(res.stderr, args.join(' ')).toMatch(message);
    }
  }, 120_000); // ten processes, each starting tsx

  it('when asked for help, then the usage names the options', () => {
    const res = cli('plan', '--help');
    expect(res.status).toBe(0);
    for (const o of ['--profile', '--pattern', '--chart', '--fabric', '--fit', '--waist-offset']) expect(res.stdout).toContain(o);
  });
});
