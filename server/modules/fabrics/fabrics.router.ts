import type { Router } from 'express';
import { ownedRouter } from '../../http/owned-router.ts';
import { toFabricDto } from './fabrics.mapper.ts';
import { createFabricSchema, updateFabricSchema } from './fabrics.schemas.ts';
import type { FabricsService } from './fabrics.service.ts';

/** The signed-in user's fabrics. */
export function fabricsRouter(deps: { fabrics: FabricsService }): Router {
  return ownedRouter({ singular: 'fabric', plural: 'fabrics', service: deps.fabrics, toDto: toFabricDto, createSchema: createFabricSchema, updateSchema: updateFabricSchema });
}
