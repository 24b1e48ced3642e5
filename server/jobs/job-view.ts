import type { Job } from '../../shared/schemas/jobs';
import type { JobRow } from './job.entity';

/** A job row as the API answers it; `names` maps user ids to names for createdBy. */
export function toJob(row: JobRow, names: Map<number, string>): Job {
  return {
    id: row.id,
    customerName: row.customerName,
    siteAddress: row.siteAddress,
    state: row.state,
    contactEmail: row.contactEmail,
    contactPhone: row.contactPhone,
    notes: row.notes,
    status: row.status,
    createdBy: row.createdBy === null ? null : { id: row.createdBy, name: names.get(row.createdBy) ?? 'Former user' },
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}
