import { paths } from '../config/paths';
import type { Role } from '../types/api';

/**
 * The areas of Blockwright, who may enter each, and what each is for. The app shell's
 * navigation, the dashboard and the "coming" pages all read this one list.
 */

export type AreaId =
  | 'makes'
  | 'patterns'
  | 'fitPlanner'
  | 'fabrics'
  | 'library'
  | 'coaching'
  | 'adminUsers'
  | 'adminOutbox'
  | 'account';

export type AreaGroup = 'work' | 'together' | 'admin' | 'self';

export type Area = {
  id: AreaId;
  /** The link's visible text, which is also its accessible name. */
  label: string;
  to: string;
  group: AreaGroup;
  /** Who sees the area; everyone signed in when absent. */
  roles?: readonly Role[];
  /** One sentence on what the area does (or will do). */
  summary: string;
  /** False while the area shows its "coming" page. */
  built: boolean;
};

export const coachRoles: readonly Role[] = ['coach', 'admin'];
export const adminRoles: readonly Role[] = ['admin'];

export const areas: readonly Area[] = [
  {
    id: 'makes',
    label: 'Makes',
    to: paths.makes.build(),
    group: 'work',
    summary:
      'A make gathers one garment in progress: your measurements, the pattern, the fabric, each round of alterations, fit notes and photos, shared with a sewing friend or coach if you invite them.',
    built: true,
  },
  {
    id: 'patterns',
    label: 'Patterns',
    to: paths.patterns.build(),
    group: 'work',
    summary:
      'Upload trouser pattern pieces as SVG or DXF (ASTM D6673) with their nested size lines, then label each piece: grainline, hip, crotch and knee levels, lengthen/shorten lines, notches and seams.',
    built: true,
  },
  {
    id: 'fitPlanner',
    label: 'Fit planner',
    to: paths.fitPlanner.build(),
    group: 'work',
    summary:
      'Keep measurement profiles for yourself and the people you sew for, each a dated history with the change since last time, including girths where a raised or lowered waistband sits; a make’s workspace plans a size per level from them.',
    built: true,
  },
  {
    id: 'fabrics',
    label: 'Fabrics',
    to: paths.fabrics.build(),
    group: 'work',
    summary:
      'Keep a record of your cloths — stretch each way from a hand test, recovery, weight in g/m² or oz/yd², width, shrinkage from a wash test — and see when a plan will suggest pre-washing or enlarging the pieces.',
    built: true,
  },
  {
    id: 'library',
    label: 'Shared library',
    to: paths.library.build(),
    group: 'together',
    summary:
      'Patterns that coaches have published for everyone here, ready to start a make from.',
    built: true,
  },
  {
    id: 'coaching',
    label: 'Coaching',
    to: paths.coaching.build(),
    group: 'together',
    roles: coachRoles,
    summary:
      'Your classes and the makes you are invited to: review pieces, leave comments pinned to a spot, propose alteration revisions and publish patterns to a class library.',
    built: false,
  },
  {
    id: 'adminUsers',
    label: 'Users',
    to: paths.adminUsers.build(),
    group: 'admin',
    roles: adminRoles,
    summary: 'Every account on this Blockwright, with the role each one holds.',
    built: true,
  },
  {
    id: 'adminOutbox',
    label: 'Outbox',
    to: paths.adminOutbox.build(),
    group: 'admin',
    roles: adminRoles,
    summary: 'The e-mails the built-in test mail server has kept, such as password-reset links.',
    built: true,
  },
  {
    id: 'account',
    label: 'Account',
    to: paths.account.build(),
    group: 'self',
    summary: 'Your display name, password and units (inches or centimetres).',
    built: true,
  },
];

function canEnter(area: Pick<Area, 'roles'>, role: Role): boolean {
  return !area.roles || area.roles.includes(role);
}

export function areasFor(role: Role): Area[] {
  return areas.filter((area) => canEnter(area, role));
}

export function areaById(id: AreaId): Area {
  const area = areas.find((each) => each.id === id);
  if (!area) throw new Error(`No area named ${id}`);
  return area;
}

export const groupLabels: Record<AreaGroup, string> = {
  work: 'Your work',
  together: 'Together',
  admin: 'Admin',
  self: 'You',
};
