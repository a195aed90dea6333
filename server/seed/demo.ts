import type { Role } from '../modules/users/user.entity.ts';
import type { UsersService } from '../modules/users/users.service.ts';

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

/** Seed the demo accounts into an empty database. Returns true when it seeded. */
export async function seedDemo(users: UsersService): Promise<boolean> {
  if ((await users.count()) > 0) return false;
  for (const account of DEMO_ACCOUNTS) {
    await users.create(account);
  }
  return true;
}
