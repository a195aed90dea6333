import type { DataSource, EntityManager } from 'typeorm';
import {
  type AlterationEntry,
  AlterationListError,
  type AlterationOp,
  type FitNote,
  type FitPlan,
  FitInputError,
  type Pattern,
  type SizeChart,
  alterationEntriesSchema,
  chartFromPattern,
  fillChartGaps,
  planFit,
  replayAlterations,
} from '../../../geometry/index.ts';
import { AppError, forbidden, notFound } from '../../errors/app-error.ts';
import type { Actor, PatternsService } from '../patterns/patterns.service.ts';
import { FabricEntity } from '../fabrics/fabric.entity.ts';
import { ProfileEntity } from '../profiles/profile.entity.ts';
import { UserEntity } from '../users/user.entity.ts';
import { MakeRevisionEntity } from './make-revision.entity.ts';
import { MakeEntity } from './make.entity.ts';
import {
  type MakeDetailDto,
  type MakeSummaryDto,
  type RevisionDto,
  type RevisionSummaryDto,
  toMakeSummaryDto,
  toRevisionDto,
  toRevisionSummaryDto,
} from './makes.mapper.ts';

interface SaveRevisionInput {
  baseRevision: number;
  alterations: AlterationEntry[];
  summary: string;
  restoredFrom?: number;
}

/**
 * Makes and their revisions. A make belongs to its owner (sharing comes with collaboration).
 * Every save appends a revision; a save made on a revision that is no longer the newest is
 * refused with 409 so that two people never overwrite each other's work.
 */
export class MakesService {
  constructor(
    private readonly db: DataSource,
    private readonly patterns: PatternsService,
  ) {}

  private get repo() {
    return this.db.getRepository(MakeEntity);
  }

  /** The make when the person may work on it; 404 when missing, 403 when it is someone else's. */
  async load(actor: Actor, id: string): Promise<MakeEntity> {
    const make = await this.repo.findOneBy({ id });
    if (!make) throw notFound('This make');
    if (make.ownerId !== actor.id) throw forbidden('This make belongs to someone else.');
    return make;
  }

  private async summaries(where: string, params: unknown[]): Promise<MakeSummaryDto[]> {
    const rows: { id: string; pattern_name: string; profile_name: string | null; alteration_count: number | null }[] = await this.db.query(
      `SELECT m.id, p.name AS pattern_name, pr.name AS profile_name, jsonb_array_length(r.alterations) AS alteration_count
         FROM makes m
         JOIN patterns p ON p.id = m.pattern_id
         LEFT JOIN profiles pr ON pr.id = m.profile_id
         LEFT JOIN make_revisions r ON r.make_id = m.id AND r.number = m.latest_revision
        WHERE ${where}
        ORDER BY m.updated_at DESC
        LIMIT 500`,
      params,
    );
    if (rows.length === 0) return [];
    const makes = await this.repo.createQueryBuilder('m').where('m.id IN (:...ids)', { ids: rows.map((r) => r.id) }).getMany();
    const byId = new Map(makes.map((m) => [m.id, m]));
    return rows.map((r) =>
      toMakeSummaryDto({ make: byId.get(r.id)!, patternName: r.pattern_name, profileName: r.profile_name, alterationCount: r.alteration_count ?? 0 }),
    );
  }

  list(actor: Actor, archived: boolean): Promise<MakeSummaryDto[]> {
    return this.summaries(`m.owner_id = $1 AND (m.archived_at IS NOT NULL) = $2`, [actor.id, archived]);
  }

  private async summary(id: string): Promise<MakeSummaryDto> {
    const [one] = await this.summaries('m.id = $1', [id]);
    if (!one) throw notFound('This make');
    return one;
  }

  private async authorName(id: string | null): Promise<string | null> {
    if (!id) return null;
    const user = await this.db.getRepository(UserEntity).findOneBy({ id });
    return user?.displayName ?? null;
  }

  private async revisionEntity(makeId: string, number: number, manager: EntityManager = this.db.manager): Promise<MakeRevisionEntity> {
    const revision = await manager.getRepository(MakeRevisionEntity).findOneBy({ makeId, number });
    if (!revision) throw notFound(`Revision ${number} of this make`);
    return revision;
  }

  async detail(actor: Actor, id: string): Promise<MakeDetailDto> {
    const make = await this.load(actor, id);
    const revision = await this.revisionEntity(make.id, make.latestRevision);
    return { ...(await this.summary(id)), revision: toRevisionDto(revision, await this.authorName(revision.authorId)) };
  }

  /** A kept fabric the person may use: 400 when missing, 403 when it is someone else's. */
  private async ownFabric(actor: Actor, fabricId: string): Promise<FabricEntity> {
    const kept = await this.db.getRepository(FabricEntity).findOneBy({ id: fabricId });
    if (!kept) throw new AppError('invalid_input', 'That fabric does not exist.', 400, { fabricId: 'No such fabric.' });
    if (kept.ownerId !== actor.id) throw forbidden('That fabric belongs to someone else.');
    return kept;
  }

  private async checkProfile(actor: Actor, profileId: string | null | undefined): Promise<void> {
    if (!profileId) return;
    const profile = await this.db.getRepository(ProfileEntity).findOneBy({ id: profileId });
    if (!profile) throw new AppError('invalid_input', 'That profile does not exist.', 400, { profileId: 'No such profile.' });
    if (profile.ownerId !== actor.id) throw forbidden('That profile belongs to someone else.');
  }

  /** Replay the list on the make's pattern: a list the engine refuses is not saved (422, naming the entry). */
  private async checkReplay(actor: Actor, patternId: string, alterations: AlterationEntry[]): Promise<void> {
    const { pattern } = await this.patterns.loadVisible(actor, patternId);
    try {
      replayAlterations(pattern, alterations);
    } catch (e) {
      if (e instanceof AlterationListError)
        throw new AppError('unprocessable', `The alterations cannot be applied: ${e.message}`, 422, { [`alterations.${e.index}`]: e.message });
      throw e;
    }
  }

  private async createWith(
    actor: Actor,
    input: { name: string; patternId: string; profileId: string | null; fabricNote: string; fabricId?: string | null; sourceMakeId: string | null },
    first: { alterations: AlterationEntry[]; summary: string }): Promise<string> {
    return this.db.transaction(async (manager) => {
      const make = await manager.getRepository(MakeEntity).save(
        manager.getRepository(MakeEntity).create({ ownerId: actor.id, ...input, latestRevision: 1, archivedAt: null }),
      );
      await manager.getRepository(MakeRevisionEntity).insert({ makeId: make.id, number: 1, alterations: first.alterations, summary: first.summary, authorId: actor.id, restoredFrom: null });
      return make.id;
    });
  }

  async create(actor: Actor, input: { name: string; patternId: string; profileId: string | null; fabricNote: string }): Promise<MakeDetailDto> {
    // The pattern must be one the person may use: their own or one in the shared library.
    try {
      await this.patterns.loadVisible(actor, input.patternId);
    } catch (e) {
      if (e instanceof AppError && e.status === 404) throw new AppError('invalid_input', 'That pattern does not exist.', 400, { patternId: 'No such pattern.' });
      throw e;
    }
    await this.checkProfile(actor, input.profileId);
    const id = await this.createWith(actor, { ...input, fabricId: null, sourceMakeId: null }, { alterations: [], summary: 'Started the make' });
    return this.detail(actor, id);
  }

  /** "Sew it again": a new make on the same pattern, starting from this make's newest alterations. */
  async duplicate(actor: Actor, id: string, name: string | undefined): Promise<MakeDetailDto> {
    const source = await this.load(actor, id);
    const revision = await this.revisionEntity(source.id, source.latestRevision);
    const newId = await this.createWith(
      actor,
      { name: name ?? `${source.name} (again)`.slice(0, 120), patternId: source.patternId, profileId: source.profileId, fabricNote: source.fabricNote, fabricId: source.fabricId, sourceMakeId: source.id },
      { alterations: revision.alterations, summary: `Started from “${source.name}”, revision ${revision.number}` },
    );
    return this.detail(actor, newId);
  }

  async update(actor: Actor, id: string, input: { name?: string; profileId?: string | null; fabricNote?: string; fabricId?: string | null; archived?: boolean }): Promise<MakeDetailDto> {
    const make = await this.load(actor, id);
    await this.checkProfile(actor, input.profileId);
    if (input.fabricId) await this.ownFabric(actor, input.fabricId);
    const changes: Partial<MakeEntity> = {};
    if (input.name !== undefined) changes.name = input.name;
    if (input.profileId !== undefined) changes.profileId = input.profileId;
    if (input.fabricNote !== undefined) changes.fabricNote = input.fabricNote;
    if (input.fabricId !== undefined) changes.fabricId = input.fabricId;
    if (input.archived !== undefined) changes.archivedAt = input.archived ? (make.archivedAt ?? new Date()) : null;
    await this.repo.update({ id }, changes);
    return this.detail(actor, id);
  }

  /** The make's pattern with its newest revision applied (for printing). */
  async alteredPattern(actor: Actor, id: string): Promise<{ pattern: Pattern; makeName: string }> {
    const make = await this.load(actor, id);
    const revision = await this.revisionEntity(make.id, make.latestRevision);
    const { pattern } = await this.patterns.loadVisible(actor, make.patternId);
    try {
      return { pattern: replayAlterations(pattern, revision.alterations).pattern, makeName: make.name };
    } catch (e) {
      if (e instanceof AlterationListError) throw new AppError('unprocessable', `This make's alterations cannot be applied to its pattern now: ${e.message}`, 422);
      throw e;
    }
  }

  /** The printed table, with what it leaves out measured on the pieces (when they can be measured). */
  private printedWithGaps(printed: SizeChart, pattern: Pattern): SizeChart {
    try {
      return fillChartGaps(printed, chartFromPattern(pattern));
    } catch (e) {
      if (e instanceof FitInputError) return printed;
      throw e;
    }
  }

  /** Record how the make fit (replacing the earlier note), or with null forget it. */
  async setFitNote(actor: Actor, id: string, note: FitNote | null): Promise<MakeEntity['fitNote']> {
    await this.load(actor, id);
    const fitNote = note ? { ...note, updatedAt: new Date().toISOString() } : null;
    await this.repo.update({ id }, { fitNote });
    return fitNote;
  }

  /**
   * The fit plan for this make: its profile's body (current dated set) against the pattern's
   * printed size table, or the finished measurements measured on its pieces; the fabric given,
   * else the make's fabric; the fit note of the make it repeats ("sew it again"); the make's
   * alterations now for the "before" garment. Nothing is saved: the person accepts the plan's
   * alterations into the list as a revision.
   */
  async plan(
    actor: Actor & { units?: 'in' | 'cm' },
    id: string,
    input: { fabric?: unknown; fabricId?: string; options: Record<string, unknown>; chart?: 'printed' | 'measured' },
  ): Promise<{ plan: FitPlan; previous: { makeId: string; makeName: string; fitNote: MakeEntity['fitNote'] } | null }> {
    const make = await this.load(actor, id);
    let fabric = input.fabric;
    const fabricId = input.fabric === undefined ? (input.fabricId ?? make.fabricId ?? undefined) : undefined;
    if (fabricId !== undefined) fabric = (await this.ownFabric(actor, fabricId)).properties;
    if (!make.profileId) throw new AppError('conflict', 'This make has no measurement profile: choose one before planning.', 409);
    const profile = await this.db.getRepository(ProfileEntity).findOneBy({ id: make.profileId });
    if (!profile) throw new AppError('conflict', 'This make has no measurement profile: choose one before planning.', 409);
    const { entity, pattern } = await this.patterns.loadVisible(actor, make.patternId);
    if (input.chart === 'printed' && !entity.sizeChart)
      throw new AppError('invalid_input', 'This pattern has no printed size table: type it in on the pattern, or plan from the pieces.', 400, { chart: 'No printed size table.' });
    const chart = input.chart !== 'measured' && entity.sizeChart ? this.printedWithGaps(entity.sizeChart, pattern) : undefined;
    // the make this one repeats, when it is still the same person's (its note may be null: not written yet)
    const source = make.sourceMakeId ? await this.repo.findOneBy({ id: make.sourceMakeId, ownerId: actor.id }) : null;
    const previous = source ? { makeId: source.id, makeName: source.name, fitNote: source.fitNote } : null;
    const revision = await this.revisionEntity(make.id, make.latestRevision);
    const current: AlterationOp[] = revision.alterations.filter((e) => e.enabled).map((e) => e.op);
    try {
      const plan = planFit({
        unit: actor.units ?? 'cm',
        ...input.options,
        profile: { name: profile.name, measurements: profile.measurements, girthsAtHeights: profile.girthsAtHeights },
        pattern,
        current,
        ...(chart ? { chart } : {}),
        ...(fabric !== undefined ? { fabric } : {}),
        ...(previous?.fitNote ? { previous: { note: { levels: previous.fitNote.levels, nextTime: previous.fitNote.nextTime }, makeName: previous.makeName } } : {}),
      });
      return { plan, previous };
    } catch (e) {
      if (e instanceof FitInputError) throw new AppError('invalid_input', `The plan cannot be made: ${e.message}`, 400, { plan: e.message });
      throw e;
    }
  }

  async revisions(actor: Actor, id: string): Promise<RevisionSummaryDto[]> {
    await this.load(actor, id);
    const rows = await this.db.getRepository(MakeRevisionEntity).find({ where: { makeId: id }, order: { number: 'DESC' }, take: 1000 });
    const names = new Map<string, string | null>();
    for (const r of rows) if (r.authorId && !names.has(r.authorId)) names.set(r.authorId, await this.authorName(r.authorId));
    return rows.map((r) => toRevisionSummaryDto(r, r.authorId ? (names.get(r.authorId) ?? null) : null));
  }

  async revision(actor: Actor, id: string, number: number): Promise<RevisionDto> {
    await this.load(actor, id);
    const r = await this.revisionEntity(id, number);
    return toRevisionDto(r, await this.authorName(r.authorId));
  }

  /**
   * Append a revision. Compare-and-set on `latest_revision` inside one transaction: when another
   * save got there first, nothing is written and the caller gets 409 stale_revision.
   */
  async saveRevision(actor: Actor, id: string, input: SaveRevisionInput): Promise<RevisionDto> {
    const make = await this.load(actor, id);
    if (make.archivedAt) throw new AppError('conflict', 'This make is archived: bring it back before changing it.', 409);
    if (input.restoredFrom !== undefined && input.restoredFrom > make.latestRevision)
      throw new AppError('invalid_input', `Revision ${input.restoredFrom} does not exist.`, 400, { restoredFrom: 'No such revision.' });
    const alterations = alterationEntriesSchema.parse(input.alterations) as AlterationEntry[];
    await this.checkReplay(actor, make.patternId, alterations);
    const saved = await this.db.transaction(async (manager) => {
      const bumped: [{ latest_revision: number }[], number] = await manager.query(
        'UPDATE makes SET latest_revision = latest_revision + 1, updated_at = now() WHERE id = $1 AND latest_revision = $2 RETURNING latest_revision',
        [id, input.baseRevision],
      );
      const number = bumped[0][0]?.latest_revision;
      if (number === undefined) return undefined;
      const repo = manager.getRepository(MakeRevisionEntity);
      return repo.save(repo.create({ makeId: id, number, alterations, summary: input.summary, authorId: actor.id, restoredFrom: input.restoredFrom ?? null }));
    });
    if (!saved) {
      const latest = (await this.repo.findOneBy({ id }))?.latestRevision ?? make.latestRevision;
      throw new AppError(
        'stale_revision',
        `This make was saved again since you opened it: you changed revision ${input.baseRevision}, the newest is ${latest}. Reload to see it, or apply your change on top of it.`,
        409,
        { baseRevision: `The newest revision is ${latest}.` },
      );
    }
    return toRevisionDto(saved, await this.authorName(saved.authorId));
  }
}
