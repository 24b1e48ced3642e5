import type { Role } from '@/shared/schemas/auth';

export const ROLE_LABELS: Record<Role, string> = {
  tech: 'Technician',
  estimator: 'Estimator',
  admin: 'Admin',
};
