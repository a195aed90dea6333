import type { Router } from 'express';
import { ownedRouter } from '../../http/owned-router.ts';
import { toProfileDto } from './profiles.mapper.ts';
import { createProfileSchema, updateProfileSchema } from './profiles.schemas.ts';
import type { ProfilesService } from './profiles.service.ts';

/** The signed-in user's measurement profiles. */
export function profilesRouter(deps: { profiles: ProfilesService }): Router {
  return ownedRouter({ singular: 'profile', plural: 'profiles', service: deps.profiles, toDto: toProfileDto, createSchema: createProfileSchema, updateSchema: updateProfileSchema });
}
