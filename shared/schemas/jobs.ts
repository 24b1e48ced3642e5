import { z } from 'zod';

/** Jobs (DESIGN.md §5 contract): the customer's site a matched-system record belongs to. */

export const JOB_STATUSES = ['open', 'closed'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

const optionalText = (max: number) =>
  z.preprocess((v) => (typeof v === 'string' && v.trim() === '' ? undefined : v), z.string().trim().max(max).optional());

export const JobCreateSchema = z
  .object({
    customerName: z.string().trim().min(1, { error: 'enter the customer' }).max(120),
    siteAddress: z.string().trim().min(1, { error: 'enter the site address' }).max(300),
    state: z
      .string()
      .trim()
      .toUpperCase()
      .regex(/^[A-Z]{2}$/, { error: 'state must be a two-letter code' }),
    contactEmail: z.preprocess(
      (v) => (typeof v === 'string' && v.trim() === '' ? undefined : v),
      z.email({ error: 'enter a valid e-mail' }).max(254).optional(),
    ),
    contactPhone: optionalText(40).refine((v) => v === undefined || /^[0-9+()\-. ext]{7,40}$/i.test(v), { error: 'enter a phone number' }),
    notes: optionalText(4000),
  })
  .strict();
export type JobCreate = z.infer<typeof JobCreateSchema>;

/** PATCH /api/jobs/:id: any field of a job, and its status; null clears an optional field. */
export const JobPatchSchema = z
  .object({
    customerName: JobCreateSchema.shape.customerName.optional(),
    siteAddress: JobCreateSchema.shape.siteAddress.optional(),
    state: JobCreateSchema.shape.state.optional(),
    contactEmail: z.union([z.null(), z.email({ error: 'enter a valid e-mail' }).max(254)]).optional(),
    contactPhone: z
      .union([
        z.null(),
        z
          .string()
          .trim()
          .regex(/^[0-9+()\-. ext]{7,40}$/i, { error: 'enter a phone number' }),
      ])
      .optional(),
    notes: z.union([z.null(), z.string().trim().max(4000)]).optional(),
    status: z.enum(JOB_STATUSES).optional(),
  })
  .strict()
  .refine((p) => Object.keys(p).length > 0, { error: 'nothing to change' });
export type JobPatch = z.infer<typeof JobPatchSchema>;

export const JobListQuerySchema = z.object({
  q: z.string().trim().max(200).optional(),
  status: z.enum(JOB_STATUSES).optional(),
  page: z.coerce.number().int().min(1).max(100000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type JobListQuery = z.infer<typeof JobListQuerySchema>;

/** A job as the API returns it. */
export interface Job {
  id: number;
  customerName: string;
  siteAddress: string;
  state: string;
  contactEmail: string | null;
  contactPhone: string | null;
  notes: string | null;
  status: JobStatus;
  createdBy: { id: number; name: string } | null;
  createdAt: string;
  updatedAt: string;
}

/** One change to a job: who, when, and each field's value before and after. */
export interface JobChange {
  at: string;
  by: { id: number; name: string } | null;
  changes: { field: string; from: unknown; to: unknown }[];
}
