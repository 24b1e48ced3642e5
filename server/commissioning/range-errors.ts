import { ReadingInputError } from '../../shared/commissioning';
import { SaturationRangeError } from '../../shared/refrigerants';
import { AppError } from '../lib/errors';

/** A 422 naming one field, in the same shape as a schema failure (DESIGN.md §5). */
export function fieldError(path: string, message: string): AppError {
  return new AppError('validation-failed', 'The request did not pass validation.', 422, [{ path, message }]);
}

/**
 * Runs a saturation computation; a reading outside the refrigerant's valid range (below zero
 * absolute, past the critical point) is bad input, so it becomes a 422 naming the field.
 */
export function withRangeCheck<T>(compute: () => T, fieldName: (field: string) => string = (f) => f): T {
  try {
    return compute();
  } catch (err) {
    if (err instanceof SaturationRangeError)
      throw fieldError(err.field === 'refrigerant' ? 'refrigerant' : fieldName(err.field), err.message);
    if (err instanceof ReadingInputError) throw fieldError(err.field, err.message);
    throw err;
  }
}
