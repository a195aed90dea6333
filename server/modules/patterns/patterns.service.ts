import path from 'node:path';
import type { DataSource } from 'typeorm';
import {
  FitInputError,
  type Pattern,
  PatternError,
  parsePattern,
  type SizeChart,
  alignChartSizes,
  chartFromPattern,
  patternSizes,
} from '../../../geometry/index.ts';
import { AppError, forbidden, notFound } from '../../errors/app-error.ts';
import type { Role } from '../users/user.entity.ts';
import { UserEntity } from '../users/user.entity.ts';
import { ImportRunner } from './import-runner.ts';
import type { UploadedFile } from './import-upload.ts';
import { type PatternSource, PatternEntity } from './pattern.entity.ts';
import { type PatternDetailDto, type PatternSummaryDto, type SizeChartsDto, toPatternDetailDto, toPatternSummaryDto } from './patterns.mapper.ts';

export interface Actor {
  id: string;
  role: Role;
}


/** Roles that may publish a pattern to the shared library. */
const PUBLISHERS: readonly Role[] = ['coach', 'admin'];


/** Patterns: upload, read, label, publish. Private to the owner until a coach publishes one. */
export class PatternsService {
  constructor(
    private readonly db: DataSource,
    /** Reads uploaded files off the main thread, with limits (see import-runner.ts). */
    private readonly imports: ImportRunner = new ImportRunner(),
  ) {}

  private get repo() {
    return this.db.getRepository(PatternEntity);
  }

  private async ownerNames(ids: readonly string[]): Promise<Map<string, string>> {
    if (ids.length === 0) return new Map();
    const users = await this.db.getRepository(UserEntity).createQueryBuilder('u').select(['u.id', 'u.displayName']).where('u.id IN (:...ids)', { ids: [...new Set(ids)] }).getMany();
    return new Map(users.map((u) => [u.id, u.displayName]));
  }

  async create(ownerId: string, input: { pattern: Pattern; name: string; format: PatternSource; sourceName: string; notes: string[] }): Promise<PatternEntity> {
    const saved = await this.repo.save(
      this.repo.create({
        ownerId,
        name: input.name,
        sourceFormat: input.format,
        sourceName: input.sourceName.slice(0, 200),
        data: input.pattern,
        pieceCount: input.pattern.pieces.length,
        sizes: patternSizes(input.pattern),
        importNotes: input.notes.slice(0, 50),
        publishedAt: null,
      }),
    );
    return saved;
  }

  async upload(ownerId: string, file: UploadedFile | undefined, name: string | undefined): Promise<PatternDetailDto> {
    if (!file) throw new AppError('invalid_input', 'Choose a pattern file to upload.', 400, { file: 'Choose an SVG or DXF file.' });
    const imported = await this.imports.run(file);
    const fallbackName = imported.pattern.name ?? (path.basename(file.originalname, path.extname(file.originalname)).trim() || 'Untitled pattern');
    const entity = await this.create(ownerId, { pattern: imported.pattern, name: name ?? fallbackName.slice(0, 120), format: imported.format, sourceName: file.originalname, notes: imported.notes });
    return this.detail({ id: ownerId, role: 'sewist' }, entity.id);
  }

  async list(actor: Actor, scope: 'mine' | 'library'): Promise<PatternSummaryDto[]> {
    const rows =
      scope === 'mine'
        ? await this.repo.find({ where: { ownerId: actor.id }, order: { createdAt: 'DESC' }, take: 500 })
        : await this.repo.createQueryBuilder('p').where('p.published_at IS NOT NULL').orderBy('p.published_at', 'DESC').take(500).getMany();
    const names = await this.ownerNames(rows.map((r) => r.ownerId));
    return rows.map((r) => toPatternSummaryDto(r, names.get(r.ownerId) ?? 'someone'));
  }

  /** May this person see the pattern? Its owner, anyone once published, and whoever has a make on it. */
  private async canSee(actor: Actor, p: PatternEntity): Promise<boolean> {
    if (p.ownerId === actor.id || p.publishedAt !== null) return true;
    const rows: unknown[] = await this.db.query('SELECT 1 FROM makes WHERE pattern_id = $1 AND owner_id = $2 LIMIT 1', [p.id, actor.id]);
    return rows.length > 0;
  }

  /** The pattern row with its geometry; 404 when missing, 403 when the person may not see it. */
  async loadVisible(actor: Actor, id: string): Promise<{ entity: PatternEntity; pattern: Pattern }> {
    const entity = await this.repo.createQueryBuilder('p').addSelect('p.data').where('p.id = :id', { id }).getOne();
    if (!entity) throw notFound('This pattern');
    if (!(await this.canSee(actor, entity))) throw forbidden('This pattern is private to its owner.');
    return { entity, pattern: parsePattern(entity.data) };
  }

  async detail(actor: Actor, id: string): Promise<PatternDetailDto> {
    const { entity, pattern } = await this.loadVisible(actor, id);
    const names = await this.ownerNames([entity.ownerId]);
    return toPatternDetailDto(entity, names.get(entity.ownerId) ?? 'someone', entity.ownerId === actor.id, pattern);
  }

  async update(actor: Actor, id: string, input: { name?: string; pattern?: unknown; published?: boolean }): Promise<PatternDetailDto> {
    const { entity } = await this.loadVisible(actor, id);
    const owner = entity.ownerId === actor.id;
    // Admins moderate the shared library: they may take a published pattern out of it, nothing more.
    const moderation = !owner && actor.role === 'admin' && input.published === false && input.name === undefined && input.pattern === undefined;
    if (!owner && !moderation) throw forbidden('Only the owner of a pattern may change it.');
    if (input.published === true && !PUBLISHERS.includes(actor.role)) throw forbidden('Only coaches publish patterns to the shared library.');
    const changes: Partial<PatternEntity> = {};
    if (input.name !== undefined) changes.name = input.name;
    if (input.pattern !== undefined) {
      let pattern: Pattern;
      try {
        pattern = parsePattern(input.pattern);
      } catch (e) {
        if (e instanceof PatternError)
          throw new AppError('invalid_input', `The pattern is not valid: ${e.message}`, 400, Object.fromEntries(e.issues.slice(0, 20).map((i) => [`pattern.${i.path.replace(/\[(\d+)\]/g, '.$1')}`, i.message])));
        throw e;
      }
      changes.data = pattern;
      changes.pieceCount = pattern.pieces.length;
      changes.sizes = patternSizes(pattern);
    }
    if (input.published !== undefined) changes.publishedAt = input.published ? (entity.publishedAt ?? new Date()) : null;
    const saved = await this.repo.save(this.repo.merge(entity, changes));
    // Built here, not through detail(): a moderator who just withdrew a pattern may no longer see it.
    const names = await this.ownerNames([saved.ownerId]);
    return toPatternDetailDto(saved, names.get(saved.ownerId) ?? 'someone', owner, parsePattern(saved.data));
  }

  /**
   * The printed size table (null until the owner types one) and the finished measurements
   * measured on the pieces (null, with the reason, when the pieces cannot be measured).
   */
  async sizeCharts(actor: Actor, id: string, seamAllowance: number | undefined): Promise<SizeChartsDto> {
    const { entity, pattern } = await this.loadVisible(actor, id);
    // a table saved before sizes were matched loosely still shows the pattern's labels
    const printed = entity.sizeChart && alignChartSizes(entity.sizeChart, patternSizes(pattern));
    try {
      return { printed, measured: chartFromPattern(pattern, seamAllowance !== undefined ? { seamAllowance } : {}) };
    } catch (e) {
      if (e instanceof FitInputError) return { printed, measured: null, measuredError: `The pieces cannot be measured: ${e.message}.` };
      throw e;
    }
  }

  /**
   * Replace (or with null, clear) the printed size table: the owner only. Its sizes take the
   * pattern's labels where they are written differently ("Size 08" → "8"; `alignChartSizes`).
   */
  async setSizeChart(actor: Actor, id: string, chart: SizeChart | null): Promise<SizeChart | null> {
    const { entity, pattern } = await this.loadVisible(actor, id);
    if (entity.ownerId !== actor.id) throw forbidden('Only the owner of a pattern may change its size table.');
    const printed = chart ? { ...alignChartSizes(chart, patternSizes(pattern)), source: 'printed' as const } : null;
    await this.repo.update({ id }, { sizeChart: printed });
    return printed;
  }

  async remove(actor: Actor, id: string): Promise<void> {
    const { entity } = await this.loadVisible(actor, id);
    if (entity.ownerId !== actor.id) throw forbidden('Only the owner of a pattern may delete it.');
    const used: { count: string }[] = await this.db.query('SELECT count(*) FROM makes WHERE pattern_id = $1', [id]);
    const count = Number(used[0]?.count ?? 0);
    if (count > 0) throw new AppError('in_use', `This pattern is used by ${count} make${count === 1 ? '' : 's'}; it cannot be deleted.`, 409);
    await this.repo.delete({ id });
  }
}
