import { Users1764650000000 } from './1764650000000-users';

/** Every migration, in order. Add new ones at the end (one file per change, named by timestamp). */
export const migrations = [Users1764650000000];
