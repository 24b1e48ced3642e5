import type { Job, JobCreate, JobPatch, JobStatus } from '@/shared/schemas/jobs';

const OPTIONAL = ['contactEmail', 'contactPhone', 'notes'] as const;
const REQUIRED = ['customerName', 'siteAddress', 'state'] as const;

/** The job's editable fields as the form's text values (an empty optional field is an empty string). */
export function jobFormValues(job: Job) {
  return {
    customerName: job.customerName,
    siteAddress: job.siteAddress,
    state: job.state,
    contactEmail: job.contactEmail ?? '',
    contactPhone: job.contactPhone ?? '',
    notes: job.notes ?? '',
  };
}

/**
 * PATCH /api/jobs/:id body from the form as validated and the status chosen: only what differs from the
 * job as loaded, an emptied optional field as null (clears it). Null when nothing changed.
 */
export function jobPatchFrom(job: Job, edited: JobCreate, status: JobStatus): JobPatch | null {
  const patch: Record<string, string | null> = {};
  for (const key of REQUIRED) if (edited[key] !== job[key]) patch[key] = edited[key];
  for (const key of OPTIONAL) {
    const next = edited[key] ?? null;
    if (next !== (job[key] ?? null)) patch[key] = next;
  }
  if (status !== job.status) patch.status = status;
  return Object.keys(patch).length > 0 ? (patch as JobPatch) : null;
}
