import type { ResolvedPart } from '../../shared/rules/types';
import type { CatalogKind } from '../../shared/schemas/equipment';
import type { AppContext } from '../context';
import { findCatalogItem, toSpec, type SpecByKind } from '../catalog/catalog-specs';
import { AppError } from '../lib/errors';

type PartKind = Exclude<CatalogKind, 'rated-combinations'>;
type PartInput<T> = { id: number; kept?: boolean } | { spec: T; kept?: boolean };

/** A part given by catalog id or typed spec, resolved to its spec; an unknown id is a 422 naming the part. */
export async function resolvePart<K extends PartKind>(
  ctx: AppContext,
  kind: K,
  path: string,
  part: PartInput<SpecByKind[K]> | undefined,
): Promise<ResolvedPart<SpecByKind[K]> | undefined> {
  if (!part) return undefined;
  const kept = part.kept ?? false;
  if ('spec' in part) return { spec: part.spec, kept };
  const row = await findCatalogItem(ctx, kind, part.id);
  if (!row) {
    throw new AppError('validation-failed', 'The request did not pass validation.', 422, [
      { path: `${path}.id`, message: `no ${kind.replace(/s$/, '').replace('-', ' ')} with id ${part.id} in the catalog` },
    ]);
  }
  return { spec: toSpec(kind, row), kept, id: part.id };
}
