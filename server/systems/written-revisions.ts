import type { DataSource } from 'typeorm';
import type { RecordContent } from './system-types';

/** What an edit of a revision starts from: its content, and the install date its check was pinned to. */
export interface EditBase {
  content: RecordContent;
  installDate: string;
}

/*
 * The content of the revisions this process wrote, so the next edit of a record (mostly by the tech who
 * just saved it) neither reads nor parses them again. A revision's content never changes once committed
 * (finalize changes its status only) and its number is unique per record, so (record, number) names one
 * content on every server instance; entries are added only after the commit, and carry the record's
 * creation time so a record id used again (a database put back from a copy) never meets old content.
 */
const written = new WeakMap<DataSource, Map<string, EditBase & { recordCreatedAt: string }>>();
const MAX_WRITTEN = 2000;

const keyOf = (systemId: number, revision: number) => `${systemId}:${revision}`;

/** The record as the cache tells records apart. */
interface RecordKey {
  id: number;
  createdAt: string;
}

/** Remembers revision `revision` of `record` as committed with `base`. */
export function rememberWritten(dataSource: DataSource, record: RecordKey, revision: number, base: EditBase): void {
  let byKey = written.get(dataSource);
  if (!byKey) written.set(dataSource, (byKey = new Map()));
  byKey.delete(keyOf(record.id, revision - 1));
  if (byKey.size >= MAX_WRITTEN) byKey.delete(byKey.keys().next().value!);
  byKey.set(keyOf(record.id, revision), { ...base, recordCreatedAt: record.createdAt });
}

/** The content of revision `revision` of `record` if this process wrote it. */
export function writtenBase(dataSource: DataSource, record: RecordKey, revision: number): EditBase | undefined {
  const found = written.get(dataSource)?.get(keyOf(record.id, revision));
  return found?.recordCreatedAt === record.createdAt ? found : undefined;
}
