import type { DataSource } from 'typeorm';
import { type AlterationEntry, type SizeChart, chartFromPattern, demoPattern, parsePattern } from '../../geometry/index.ts';
import { FabricsService } from '../modules/fabrics/fabrics.service.ts';
import { MakesService } from '../modules/makes/makes.service.ts';
import { PatternsService } from '../modules/patterns/patterns.service.ts';
import { ProfilesService } from '../modules/profiles/profiles.service.ts';
import type { Role } from '../modules/users/user.entity.ts';
import { UsersService } from '../modules/users/users.service.ts';

/**
 * The demo scenario, invented for Blockwright: Loomhollow Sewing Studio, a small community
 * studio. Two sewists of different builds make trousers from the same patterns, a coach
 * reviews their fitting, and an admin runs the service. No real people.
 */
export interface DemoAccount {
  email: string;
  password: string;
  displayName: string;
  role: Role;
  about: string;
}

export const DEMO_PASSWORD = 'demo-password-1';

export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  {
    email: 'ada@loomhollow.example',
    password: DEMO_PASSWORD,
    displayName: 'Ada Brightwater',
    role: 'sewist',
    about: 'Sewist. Short and curvy: a small waist, full hips and thighs; shortens every leg.',
  },
  {
    email: 'rui@loomhollow.example',
    password: DEMO_PASSWORD,
    displayName: 'Rui Tallis',
    role: 'sewist',
    about: 'Sewist. Tall and straight: waist and hip close in size, long legs, likes a higher rise.',
  },
  {
    email: 'mina@loomhollow.example',
    password: DEMO_PASSWORD,
    displayName: 'Mina Okafor-Lund',
    role: 'coach',
    about: 'Coach. Teaches the studio\'s trouser-fitting evenings and reviews the members\' alterations.',
  },
  {
    email: 'admin@loomhollow.example',
    password: DEMO_PASSWORD,
    displayName: 'Studio Admin',
    role: 'admin',
    about: 'Admin. Runs the studio\'s Blockwright service: accounts, roles, the shared library.',
  },
];

/** The studio's own straight-leg trouser (geometry/demo-pattern.ts), published by the coach. */
export const DEMO_PATTERN_NAME = 'Loomhollow straight-leg trouser';

/**
 * Ada's first make: the blend and length changes she worked out with the coach. Invented for
 * the demo, in the spirit of the trade facts in issue 3 (a small waist, fuller hip and thigh,
 * legs 3 in shorter, 2 in more rise).
 */
export const DEMO_ADA_ALTERATIONS: AlterationEntry[] = [
  {
    id: 'demo-blend',
    enabled: true,
    op: { op: 'blend', levels: [{ level: 'waist', size: '0' }, { level: 'hip', size: '4' }, { level: 'thigh', size: '8' }, { level: 'calf', size: '10' }] },
  },
  { id: 'demo-shorten', enabled: true, op: { op: 'lengthen', line: 'lower leg', amount: -76.2 } },
  { id: 'demo-rise', enabled: true, op: { op: 'rise', line: 'rise', amount: 50.8 } },
];

/** Seed the demo studio into an empty database: accounts, the shared pattern, profiles, makes. Returns true when it seeded. */
export async function seedDemo(db: DataSource): Promise<boolean> {
  const users = new UsersService(db);
  if ((await users.count()) > 0) return false;
  const byEmail = new Map<string, { id: string; role: Role }>();
  for (const account of DEMO_ACCOUNTS) {
    const user = await users.create(account);
    byEmail.set(account.email, { id: user.id, role: user.role });
  }
  const mina = byEmail.get('mina@loomhollow.example')!;
  const ada = byEmail.get('ada@loomhollow.example')!;
  const rui = byEmail.get('rui@loomhollow.example')!;

  const patterns = new PatternsService(db);
  const pattern = await patterns.create(mina.id, { pattern: demoPattern(), name: DEMO_PATTERN_NAME, format: 'demo', sourceName: 'made by Blockwright', notes: [] });
  await patterns.update(mina, pattern.id, { published: true });
  await patterns.setSizeChart(mina, pattern.id, demoPrintedSizeChart());

  const profiles = new ProfilesService(db);
  const makes = new MakesService(db, patterns);
  // Invented bodies (mm), matching the accounts' descriptions.
  const adaProfile = await profiles.create(ada.id, {
    name: 'Ada',
    takenOn: '2026-03-14',
    note: 'Measured at the studio by Mina.',
    measurements: { waistGirth: 655, hipGirth: 990, thighGirth: 610, kneeGirth: 385, calfGirth: 365, bodyRise: 255, insideLegLength: 700, height: 1580 },
  });
  // Measured again in the autumn: a little fuller at the hip and thigh, and the girth where a
  // higher waistband sits.
  await profiles.update(ada.id, adaProfile.id, {
    takenOn: '2026-11-20',
    note: 'Measured again before the second pair.',
    measurements: { waistGirth: 660, hipGirth: 1000, thighGirth: 620, kneeGirth: 390, calfGirth: 370, bodyRise: 255, insideLegLength: 700, height: 1580 },
    girthsAtHeights: [
      { offset: 50.8, girth: 645 },
      { offset: -50.8, girth: 760 },
    ],
  });
  const adaDenim = await new FabricsService(db).create(ada.id, {
    name: 'Rigid indigo denim',
    properties: { stretchAcross: 2, stretchAlong: 1, recovery: 95, weightOzPerSqYd: 12, width: 1500, shrinkage: { warp: { before: 500, after: 485 }, weft: { before: 500, after: 492 } }, prewashed: true },
  });
  const ruiProfile = await profiles.create(rui.id, {
    name: 'Rui',
    measurements: { waistGirth: 820, hipGirth: 930, thighGirth: 560, kneeGirth: 390, calfGirth: 370, bodyRise: 280, insideLegLength: 860, height: 1860 },
  });
  const adaMake = await makes.create(ada, { name: 'Everyday jeans', patternId: pattern.id, profileId: adaProfile.id, fabricNote: 'Rigid indigo denim, 12 oz, 150 cm wide; washed twice before cutting.' });
  await makes.saveRevision(ada, adaMake.id, { baseRevision: adaMake.latestRevision, alterations: DEMO_ADA_ALTERATIONS, summary: 'Blended 0–4–8–10, shortened the legs 3 in, added 2 in of rise' });
  await makes.update(ada, adaMake.id, { fabricId: adaDenim.id });
  await makes.setFitNote(ada, adaMake.id, {
    levels: { waist: { verdict: 'tight', amount: 12.7 }, hip: { verdict: 'right' }, thigh: { verdict: 'right' }, calf: { verdict: 'loose', amount: 20 }, rise: { verdict: 'right' }, length: { verdict: 'long', amount: 12.7 } },
    nextTime: 'Waistband snug after lunch; calves a little wide. Hem half an inch shorter.',
  });
  await makes.create(rui, { name: 'Linen summer trousers', patternId: pattern.id, profileId: ruiProfile.id, fabricNote: 'Mid-weight linen, 140 cm wide.' });
  return true;
}

/**
 * The size table "printed" with the demo pattern: an invented table made from the pattern's own
 * pieces, rounded to 5 mm as a printed table would be, with the body chart each size is drafted
 * for (finished girth less the regular ease of geometry/fit/plan.ts, rounded to 5 mm). The
 * rounding leaves small differences for the size-table comparison to show.
 */
export function demoPrintedSizeChart(): SizeChart {
  const measured = chartFromPattern(parsePattern(demoPattern()));
  const r5 = (v: number | undefined): number | undefined => (v === undefined ? undefined : Math.round(v / 5) * 5);
  const defined = <T extends object>(o: T): T => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
  return {
    name: 'Loomhollow straight-leg trouser: finished measurements',
    source: 'printed',
    notes: ['Finished garment measurements; hip round the whole garment, thigh to hem round one leg.'],
    sizes: measured.sizes.map((s) => ({
      size: s.size,
      garment: defined({
        waist: r5(s.garment.waist),
        hip: r5(s.garment.hip),
        thigh: r5(s.garment.thigh),
        knee: r5(s.garment.knee),
        calf: r5(s.garment.calf),
        hem: r5(s.garment.hem),
        frontRise: r5(s.garment.frontRise),
        backRise: r5(s.garment.backRise),
        inseam: r5(s.garment.inseam),
        crotchDepth: r5(s.garment.crotchDepth),
      }),
      body: defined({
        waistGirth: r5(s.garment.waist === undefined ? undefined : s.garment.waist - 19.05),
        hipGirth: r5(s.garment.hip === undefined ? undefined : s.garment.hip - 50.8),
        thighGirth: r5(s.garment.thigh === undefined ? undefined : s.garment.thigh - 50),
        kneeGirth: r5(s.garment.knee === undefined ? undefined : s.garment.knee - 50),
        calfGirth: r5(s.garment.calf === undefined ? undefined : s.garment.calf - 40),
      }),
    })),
  };
}
