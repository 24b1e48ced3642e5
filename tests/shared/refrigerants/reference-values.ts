import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/** One check value of ../shared/reference/values.json (published or library-computed, with its source). */
export interface ReferenceValue {
  id: string;
  expected: Record<string, unknown>;
  source: string;
}

const REPO_ROOT = path.resolve(__dirname, '../../..');

/** The shared reference values: beside the checkout (CI) or beside the worktrees folder (a developer's worktree). */
export function loadReferenceValues(): ReferenceValue[] {
  const candidates = [path.resolve(REPO_ROOT, '../shared/reference/values.json'), path.resolve(REPO_ROOT, '../../shared/reference/values.json')];
  const file = candidates.find((c) => existsSync(c));
  if (!file) throw new Error(`values.json not found; looked in ${candidates.join(', ')}`);
  return JSON.parse(readFileSync(file, 'utf8')) as ReferenceValue[];
}

/** The reference value with this id (throws when missing so a test cannot pass on nothing). */
export function referenceValue(id: string): ReferenceValue {
  const found = loadReferenceValues().find((v) => v.id === id);
  if (!found) throw new Error(`values.json has no ${id}`);
  return found;
}
