import { In } from 'typeorm';
import type { EntityManager } from 'typeorm';
import { User } from '../users/user.entity';

/** Names of the given users by id, for "who did it" fields (one query). */
export async function userNames(manager: EntityManager, ids: (number | null | undefined)[]): Promise<Map<number, string>> {
  const wanted = [...new Set(ids.filter((id): id is number => typeof id === 'number'))];
  if (wanted.length === 0) return new Map();
  const users = await manager.getRepository(User).find({ where: { id: In(wanted) }, select: ['id', 'name'] });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** `{ id, name }` of a user id, or null. */
export function who(id: number | null, names: Map<number, string>): { id: number; name: string } | null {
  return id === null ? null : { id, name: names.get(id) ?? 'Former user' };
}
