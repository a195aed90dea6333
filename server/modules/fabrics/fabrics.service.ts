import type { DataSource } from 'typeorm';
import { AppError, forbidden, notFound } from '../../errors/app-error.ts';
import { fieldErrorsOf } from '../../http/parse.ts';
import { FabricEntity } from './fabric.entity.ts';
import { fabricPropertiesSchema } from './fabrics.schemas.ts';

/** Properties checked by geometry/fit's fabric schema; 400 with a message per field. */
function checkedProperties(input: unknown): Record<string, unknown> {
  const r = fabricPropertiesSchema.safeParse(input ?? {});
  if (!r.success) {
    const fields = Object.fromEntries(Object.entries(fieldErrorsOf(r.error)).map(([k, v]) => [`properties.${k}`, v]));
    throw new AppError('invalid_input', 'Some properties of the fabric are not valid.', 400, fields);
  }
  // Kept as sent (the planner applies the defaults when it reads them).
  return input as Record<string, unknown>;
}

/** Fabrics: private to their owner. */
export class FabricsService {
  constructor(private readonly db: DataSource) {}

  private get repo() {
    return this.db.getRepository(FabricEntity);
  }

  list(ownerId: string): Promise<FabricEntity[]> {
    return this.repo.find({ where: { ownerId }, order: { name: 'ASC' }, take: 500 });
  }

  /** 404 when missing, 403 when it is someone else's. */
  async get(ownerId: string, id: string): Promise<FabricEntity> {
    const fabric = await this.repo.findOneBy({ id });
    if (!fabric) throw notFound('This fabric');
    if (fabric.ownerId !== ownerId) throw forbidden('This fabric belongs to someone else.');
    return fabric;
  }

  create(ownerId: string, input: { name: string; properties: unknown }): Promise<FabricEntity> {
    return this.repo.save(this.repo.create({ ownerId, name: input.name, properties: checkedProperties(input.properties) }));
  }

  async update(ownerId: string, id: string, input: { name?: string; properties?: unknown }): Promise<FabricEntity> {
    const fabric = await this.get(ownerId, id);
    if (input.name !== undefined) fabric.name = input.name;
    if (input.properties !== undefined) fabric.properties = checkedProperties(input.properties);
    return this.repo.save(fabric);
  }

  async remove(ownerId: string, id: string): Promise<void> {
    await this.get(ownerId, id);
    await this.repo.delete({ id });
  }
}
