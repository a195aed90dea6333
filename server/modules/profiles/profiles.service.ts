import type { DataSource } from 'typeorm';
import { forbidden, notFound } from '../../errors/app-error.ts';
import { ProfileEntity } from './profile.entity.ts';

/** Measurement profiles: private to their owner. */
export class ProfilesService {
  constructor(private readonly db: DataSource) {}

  private get repo() {
    return this.db.getRepository(ProfileEntity);
  }

  list(ownerId: string): Promise<ProfileEntity[]> {
    return this.repo.find({ where: { ownerId }, order: { name: 'ASC' }, take: 200 });
  }

  /** 404 when missing, 403 when it is someone else's. */
  async get(ownerId: string, id: string): Promise<ProfileEntity> {
    const profile = await this.repo.findOneBy({ id });
    if (!profile) throw notFound('This profile');
    if (profile.ownerId !== ownerId) throw forbidden('This profile belongs to someone else.');
    return profile;
  }

  create(ownerId: string, input: { name: string; measurements: Record<string, number> }): Promise<ProfileEntity> {
    return this.repo.save(this.repo.create({ ownerId, name: input.name, measurements: input.measurements }));
  }

  async update(ownerId: string, id: string, input: { name?: string; measurements?: Record<string, number> }): Promise<ProfileEntity> {
    const profile = await this.get(ownerId, id);
    if (input.name !== undefined) profile.name = input.name;
    if (input.measurements !== undefined) profile.measurements = input.measurements;
    return this.repo.save(profile);
  }

  async remove(ownerId: string, id: string): Promise<void> {
    await this.get(ownerId, id);
    await this.repo.delete({ id });
  }
}
