import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { PatternError, PrintError, parsePattern } from '../../../geometry/index.ts';
import { AppError, forbidden, notFound } from '../../errors/app-error.ts';
import { QUEUES } from '../../jobs/jobs.ts';
import { PrintOptionsError, parsePrintOptions, printPattern } from '../print/print.service.ts';
import type { MakesService } from '../makes/makes.service.ts';
import type { Actor } from '../patterns/patterns.service.ts';
import { PrintJobEntity } from './print-job.entity.ts';

interface PrintJobData {
  id: string;
}

/** Prints made in the background: queue, run, keep the file. */
export class PrintsService {
  constructor(
    private readonly db: DataSource,
    private readonly boss: Pick<PgBoss, 'send'>,
    private readonly makes?: Pick<MakesService, 'alteredPattern'>,
  ) {}

  private get repo() {
    return this.db.getRepository(PrintJobEntity);
  }

  /** Check the pattern and options now (a 4xx for bad input), then queue the work. */
  async create(actor: Actor, input: { pattern: unknown; options: Record<string, unknown> } | { makeId: string; options: Record<string, unknown> }): Promise<PrintJobEntity> {
    const ownerId = actor.id;
    let options: ReturnType<typeof parsePrintOptions>;
    try {
      options = parsePrintOptions(input.options ?? {});
    } catch (e) {
      if (e instanceof PrintOptionsError) throw new AppError('invalid_input', `The print options are not valid: ${e.message}`, 400, { options: e.message });
      throw e;
    }
    let pattern: ReturnType<typeof parsePattern>;
    let title = options.title;
    try {
      if ('makeId' in input) {
        if (!this.makes) throw new AppError('not_found', 'Printing a make is not available here.', 404);
        const altered = await this.makes.alteredPattern(actor, input.makeId);
        pattern = altered.pattern;
        title ??= altered.makeName;
      } else pattern = parsePattern(input.pattern);
    } catch (e) {
      if (e instanceof PatternError)
        throw new AppError('unprocessable', `The pattern cannot be read: ${e.message}`, 422, Object.fromEntries(e.issues.slice(0, 20).map((i) => [`pattern.${i.path.replace(/\[(\d+)\]/g, '.$1')}`, i.message])));
      throw e;
    }
    const job = await this.repo.save(
      this.repo.create({
        ownerId,
        makeId: 'makeId' in input ? input.makeId : null,
        status: 'queued',
        progress: 0,
        format: options.format,
        title: title ?? pattern.name ?? 'Blockwright pattern',
        options: input.options as Record<string, unknown>,
        pattern,
        file: null,
        fileSize: null,
        pageCount: null,
        emptyPages: null,
        error: null,
        finishedAt: null,
      }),
    );
    await this.boss.send(QUEUES.print, { id: job.id } satisfies PrintJobData);
    return job;
  }

  /** The user's newest 100 prints, or those of one make. */
  list(ownerId: string, filter: { makeId?: string } = {}): Promise<PrintJobEntity[]> {
    return this.repo.find({ where: { ownerId, ...(filter.makeId !== undefined ? { makeId: filter.makeId } : {}) }, order: { createdAt: 'DESC' }, take: 100 });
  }

  /** The job when it is the user's; 404 when it does not exist, 403 when it is someone else's. */
  async get(ownerId: string, id: string): Promise<PrintJobEntity> {
    const job = await this.repo.findOneBy({ id });
    if (!job) throw notFound('This print');
    if (job.ownerId !== ownerId) throw forbidden('This print belongs to someone else.');
    return job;
  }

  async file(ownerId: string, id: string): Promise<{ job: PrintJobEntity; file: Buffer }> {
    const job = await this.get(ownerId, id);
    if (job.status !== 'done') throw new AppError('conflict', `This print is ${job.status}, not ready to download.`, 409);
    const row = await this.repo.createQueryBuilder('p').addSelect('p.file').where('p.id = :id', { id }).getOneOrFail();
    return { job, file: row.file! };
  }

  /** Run one queued print. A pattern that cannot be printed as asked fails the job with the reason. */
  async run(id: string): Promise<void> {
    const job = await this.repo.createQueryBuilder('p').addSelect('p.pattern').where('p.id = :id', { id }).getOne();
    if (!job || job.status === 'done') return;
    await this.repo.update({ id }, { status: 'running', progress: 10 });
    try {
      // Progress: 10 % when started, then by pages written (stored in steps of 10 %), 100 % when kept.
      let shown = 10;
      const result = await printPattern(parsePattern(job.pattern), job.options, new Date(), async (done, total) => {
        const progress = 10 + Math.floor((80 * done) / total);
        if (progress - shown < 10) return;
        shown = progress;
        await this.repo.update({ id }, { progress });
      });
      await this.repo.update(
        { id },
        {
          status: 'done',
          progress: 100,
          file: result.data,
          fileSize: result.data.length,
          pageCount: result.plan.pageCount,
          emptyPages: [...result.emptyPages],
          finishedAt: new Date(),
        },
      );
    } catch (e) {
      const known = e instanceof PrintError || e instanceof PrintOptionsError || e instanceof PatternError;
      await this.repo.update(
        { id },
        { status: 'failed', error: known ? (e as Error).message : 'The print failed on our side.', finishedAt: new Date() },
      );
      if (!known) throw e;
    }
  }
}

/** Take print jobs off the queue, one at a time. */
export async function startPrintWorker(boss: PgBoss, service: PrintsService, pollingIntervalSeconds = 1): Promise<void> {
  await boss.work<PrintJobData>(QUEUES.print, { pollingIntervalSeconds, batchSize: 1 }, async (jobs) => {
    for (const job of jobs) await service.run(job.data.id);
  });
}
