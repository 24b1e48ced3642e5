import { describe, expect, it } from 'vitest';
import { jobFormValues, jobPatchFrom } from '../../components/jobs/job-patch';
import type { Job } from '../../shared/schemas/jobs';

const job: Job = {
  id: 4,
  customerName: 'Ines Varga',
  siteAddress: '14 Larkspur Ct',
  state: 'OH',
  contactEmail: null,
  contactPhone: '555-0142',
  notes: 'Side gate code on file',
  status: 'open',
  createdBy: null,
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
};

describe('jobPatchFrom', () => {
  it('when nothing differs from the job as loaded, then there is nothing to send', () => {
    const values = jobFormValues(job);
    expect(jobPatchFrom(job, { ...values, contactEmail: undefined, notes: values.notes }, 'open')).toBeNull();
  });

  it('when fields change, an optional one is emptied and the job is closed, then only those go, the emptied one as null', () => {
    const patch = jobPatchFrom(
      job,
      { customerName: 'Ines Varga', siteAddress: '16 Larkspur Ct', state: 'KY', contactEmail: 'ines@example.test', contactPhone: undefined, notes: 'Side gate code on file' },
      'closed',
    );
    expect(patch).toEqual({ siteAddress: '16 Larkspur Ct', state: 'KY', contactEmail: 'ines@example.test', contactPhone: null, status: 'closed' });
  });
});
