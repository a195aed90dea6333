import type { FabricEntity } from './fabric.entity.ts';

export interface FabricDto {
  id: string;
  name: string;
  properties: Record<string, unknown>;
  createdAt: string;
  updatedAt: string;
}

export const toFabricDto = (f: FabricEntity): FabricDto => ({
  id: f.id,
  name: f.name,
  properties: f.properties,
  createdAt: f.createdAt.toISOString(),
  updatedAt: f.updatedAt.toISOString(),
});
