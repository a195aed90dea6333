import type { DataSource } from 'typeorm';
import { type AlterationEntry, demoPattern } from '../../geometry/index.ts';
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

  const profiles = new ProfilesService(db);
  const makes = new MakesService(db, patterns);
  // Invented bodies (mm), matching the accounts' descriptions.
  const adaProfile = await profiles.create(ada.id, {
    name: 'Ada',
    measurements: { waistGirth: 660, hipGirth: 1000, thighGirth: 620, kneeGirth: 390, calfGirth: 370, bodyRise: 255, insideLegLength: 700, height: 1580 },
  });
  const ruiProfile = await profiles.create(rui.id, {
    name: 'Rui',
    measurements: { waistGirth: 820, hipGirth: 930, thighGirth: 560, kneeGirth: 390, calfGirth: 370, bodyRise: 280, insideLegLength: 860, height: 1860 },
  });
  const adaMake = await makes.create(ada, { name: 'Everyday jeans', patternId: pattern.id, profileId: adaProfile.id, fabricNote: 'Rigid indigo denim, 12 oz, 150 cm wide; washed twice before cutting.' });
  await makes.saveRevision(ada, adaMake.id, { baseRevision: adaMake.latestRevision, alterations: DEMO_ADA_ALTERATIONS, summary: 'Blended 0–4–8–10, shortened the legs 3 in, added 2 in of rise' });
  await makes.create(rui, { name: 'Linen summer trousers', patternId: pattern.id, profileId: ruiProfile.id, fabricNote: 'Mid-weight linen, 140 cm wide.' });
  return true;
}
