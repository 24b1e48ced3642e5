import { Brackets } from 'typeorm';
import type { Job, JobChange, JobCreate, JobListQuery, JobPatch } from '../../shared/schemas/jobs';
import type { AppContext } from '../context';
import { dialectOf } from '../db/dialect';
import { withWriteLock } from '../db/write-transaction';
import { notFound } from '../lib/errors';
import { userNames, who } from '../lib/user-names';
import { JobChangeRow } from './job-change.entity';
import { JobRow } from './job.entity';
import { toJob } from './job-view';

const nowIso = () => new Date().toISOString();

/** Creates a job (open) and records its creation in the history, in one transaction. */
export async function createJob(ctx: AppContext, body: JobCreate, userId: number): Promise<Job> {
  const row = await withWriteLock(ctx, async (manager) => {
    const at = nowIso();
    const saved = await manager.getRepository(JobRow).save({
      customerName: body.customerName,
      siteAddress: body.siteAddress,
      state: body.state,
      contactEmail: body.contactEmail ?? null,
      contactPhone: body.contactPhone ?? null,
      notes: body.notes ?? null,
      status: 'open',
      createdBy: userId,
      createdAt: at,
      updatedAt: at,
    });
    await manager
      .getRepository(JobChangeRow)
      .save({ jobId: saved.id, userId, at, changes: [{ field: 'created', from: null, to: 'open' }] });
    return saved;
  });
  return toJob(row, await userNames(ctx.dataSource.manager, [userId]));
}

/** Jobs newest first, searched by customer or address (case-insensitive substring), filtered by status. */
export async function listJobs(
  ctx: AppContext,
  query: JobListQuery,
): Promise<{ items: Job[]; total: number; page: number; pageSize: number }> {
  const qb = ctx.dataSource.getRepository(JobRow).createQueryBuilder('j');
  if (query.status) qb.andWhere('j.status = :status', { status: query.status });
  if (query.q) {
    // LIKE with the wildcard characters escaped: a typed % or _ matches itself.
    const like = `%${query.q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    qb.andWhere(
      new Brackets((w) => {
        w.where("LOWER(j.customerName) LIKE :like ESCAPE '\\'", { like }).orWhere("LOWER(j.siteAddress) LIKE :like ESCAPE '\\'", { like });
      }),
    );
  }
  const [rows, total] = await qb
    .orderBy('j.createdAt', 'DESC')
    .addOrderBy('j.id', 'DESC')
    .skip((query.page - 1) * query.pageSize)
    .take(query.pageSize)
    .getManyAndCount();
  const names = await userNames(
    ctx.dataSource.manager,
    rows.map((r) => r.createdBy),
  );
  return { items: rows.map((r) => toJob(r, names)), total, page: query.page, pageSize: query.pageSize };
}

/** One job with its change history (oldest first). */
export async function getJob(ctx: AppContext, id: number): Promise<Job & { history: JobChange[] }> {
  const row = await ctx.dataSource.getRepository(JobRow).findOneBy({ id });
  if (!row) throw notFound('Job');
  const changes = await ctx.dataSource.getRepository(JobChangeRow).find({ where: { jobId: id }, order: { id: 'ASC' } });
  const names = await userNames(ctx.dataSource.manager, [row.createdBy, ...changes.map((c) => c.userId)]);
  return { ...toJob(row, names), history: changes.map((c) => ({ at: c.at, by: who(c.userId, names), changes: c.changes })) };
}

type EditableField = Exclude<keyof JobPatch, never>;

/** Applies a patch; each changed field is kept in the history with its old and new value. */
export async function updateJob(ctx: AppContext, id: number, patch: JobPatch, userId: number): Promise<Job & { history: JobChange[] }> {
  await withWriteLock(ctx, async (manager) => {
    const repo = manager.getRepository(JobRow);
    const row = await repo.findOneBy({ id });
    if (!row) throw notFound('Job');
    const changes: JobChangeRow['changes'] = [];
    for (const field of Object.keys(patch) as EditableField[]) {
      const to = patch[field] ?? null;
      const from = row[field] ?? null;
      if (to === from) continue;
      changes.push({ field, from, to });
      (row as unknown as Record<string, unknown>)[field] = to;
    }
    if (changes.length === 0) return;
    row.updatedAt = nowIso();
    await repo.save(row);
    await manager.getRepository(JobChangeRow).save({ jobId: id, userId, at: row.updatedAt, changes });
  });
  return getJob(ctx, id);
}

/** Throws 404 unless the job exists. */
export async function requireJob(ctx: AppContext, id: number): Promise<JobRow> {
  const row = await ctx.dataSource.getRepository(JobRow).findOneBy({ id });
  if (!row) throw notFound('Job');
  return row;
}

/** Throws 404 unless the job exists; a prepared read, for paths that need only that (every record save). */
export async function assertJobExists(ctx: AppContext, id: number): Promise<void> {
  if (!(await dialectOf(ctx.dataSource).hasRow(ctx.dataSource.manager, JobRow, id))) throw notFound('Job');
}
