import type { DataSource, EntityManager } from 'typeorm';
import { forbidden, notFound } from '../../errors/app-error.ts';
import { ProfileMeasurementSetEntity } from './profile-measurement-set.entity.ts';
import { ProfileEntity } from './profile.entity.ts';
import { type CreateProfileInput, type UpdateProfileInput, today } from './profiles.schemas.ts';

export type ProfileWithHistory = ProfileEntity & { history: ProfileMeasurementSetEntity[] };

/**
 * Measurement profiles: private to their owner. Every change of measurements appends a dated
 * set (never rewritten); the profile's own columns mirror the newest set by date, which is what
 * makes and the fit planner read.
 */
export class ProfilesService {
  constructor(private readonly db: DataSource) {}

  private get repo() {
    return this.db.getRepository(ProfileEntity);
  }

  list(ownerId: string): Promise<ProfileEntity[]> {
    return this.repo.find({ where: { ownerId }, order: { name: 'ASC' }, take: 200 });
  }

  /** 404 when missing, 403 when it is someone else's. */
  private async owned(ownerId: string, id: string): Promise<ProfileEntity> {
    const profile = await this.repo.findOneBy({ id });
    if (!profile) throw notFound('This profile');
    if (profile.ownerId !== ownerId) throw forbidden('This profile belongs to someone else.');
    return profile;
  }

  /** The profile with its dated history, newest first (404 / 403 as `owned`). */
  async get(ownerId: string, id: string): Promise<ProfileWithHistory> {
    const profile = await this.owned(ownerId, id);
    return Object.assign(profile, { history: await this.history(this.db.manager, id) });
  }

  private history(m: EntityManager, profileId: string): Promise<ProfileMeasurementSetEntity[]> {
    return m.getRepository(ProfileMeasurementSetEntity).find({ where: { profileId }, order: { takenOn: 'DESC', createdAt: 'DESC' }, take: 500 });
  }

  async create(ownerId: string, input: CreateProfileInput): Promise<ProfileWithHistory> {
    const takenOn = input.takenOn ?? today();
    const measurements = input.measurements ?? {};
    const girthsAtHeights = input.girthsAtHeights ?? [];
    const id = await this.db.transaction(async (m) => {
      const profile = await m.getRepository(ProfileEntity).save(
        m.getRepository(ProfileEntity).create({ ownerId, name: input.name, measurements, girthsAtHeights, takenOn }),
      );
      await m.getRepository(ProfileMeasurementSetEntity).insert({ profileId: profile.id, takenOn, measurements, girthsAtHeights, note: input.note ?? '' });
      return profile.id;
    });
    return this.get(ownerId, id);
  }

  /** Rename, and/or append a dated set (what is not sent is copied from the current set). */
  async update(ownerId: string, id: string, input: UpdateProfileInput): Promise<ProfileWithHistory> {
    await this.owned(ownerId, id);
    await this.db.transaction(async (m) => {
      const repo = m.getRepository(ProfileEntity);
      // read under a row lock, so two saves append in turn and each copies the set the other left
      const profile = await repo.createQueryBuilder('p').setLock('pessimistic_write').where('p.id = :id', { id }).getOne();
      if (!profile) throw notFound('This profile'); // deleted meanwhile
      if (input.measurements !== undefined || input.girthsAtHeights !== undefined) {
        await m.getRepository(ProfileMeasurementSetEntity).insert({
          profileId: id,
          takenOn: input.takenOn ?? today(),
          measurements: input.measurements ?? profile.measurements,
          girthsAtHeights: input.girthsAtHeights ?? profile.girthsAtHeights,
          note: input.note ?? '',
        });
        const [current] = await this.history(m, id);
        profile.measurements = current!.measurements;
        profile.girthsAtHeights = current!.girthsAtHeights;
        profile.takenOn = current!.takenOn;
      }
      if (input.name !== undefined) profile.name = input.name;
      await repo.save(profile);
    });
    return this.get(ownerId, id);
  }

  async remove(ownerId: string, id: string): Promise<void> {
    await this.owned(ownerId, id);
    await this.repo.delete({ id });
  }
}
