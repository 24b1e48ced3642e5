/** One field the user changed that the server's newer version holds differently, in words. */
export interface ConflictRow {
  key: string;
  label: string;
  mine: string;
  theirs: string;
}
