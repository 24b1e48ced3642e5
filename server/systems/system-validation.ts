import { SystemCreateSchema, type SystemCreate } from '../../shared/schemas/systems';
import { parseCheckRequest } from '../checks/check-validation';
import { validationError } from '../lib/errors';

/**
 * Validates a record body: the check part first (so a part given wrongly is reported at its own
 * field paths, as POST /api/checks does), then the record's own fields.
 */
export function parseSystemCreate(body: unknown): SystemCreate {
  const result = SystemCreateSchema.safeParse(body);
  if (result.success) return result.data;
  parseCheckRequest(body);
  throw validationError(result.error);
}
