import type { EntityManager } from 'typeorm';
import { applyPricePlan } from './import-apply';
import type { ParsedFile, ParsedRow, ParseProgress } from './import-parse';
import type { ImportPlan, PricePlanner } from './import-plan';

/** Rows planned and written at a time while the rest of the file is still being validated. */
const PART_ROWS = 2000;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** Thrown inside the transaction at the first rejected row: it rolls back what was written. */
export class RowsRejected extends Error {
  /** The whole parse, when the rejection was seen at its end (else the caller reads the rest). */
  constructor(readonly parsed?: ParsedFile) {
    super('rows rejected');
  }
}

export type PlanTotals = Pick<ImportPlan, 'unchanged' | 'unmatched'> & { inserted: number; updated: number };

/**
 * Commits a price file while it is still being validated (PostgreSQL, where the statements run in the
 * database's process): each step of the parse validates a slice of rows, and every PART_ROWS valid rows
 * are planned and written while the next slice is validated, at most one part in flight. The first
 * rejected row throws RowsRejected, so the caller's transaction rolls back and nothing is kept, as when a
 * file is checked whole first. Returns the parse's result and the plan's counts; `steps` is left where it
 * stopped, so after a rejection the caller can finish reading it for the errors.
 */
export async function writePricesWhileParsing(
  manager: EntityManager,
  steps: Generator<ParseProgress, ParsedFile>,
  plan: PricePlanner,
  distributorId: number,
  importId: number,
): Promise<{ parsed: ParsedFile; totals: PlanTotals }> {
  const totals: PlanTotals = { inserted: 0, updated: 0, unchanged: 0, unmatched: 0 };
  let written = 0;
  let inFlight: Promise<void> | null = null;
  const writeParts = async (rows: ParsedRow[], all: boolean) => {
    while (rows.length - written >= PART_ROWS || (all && written < rows.length)) {
      const part = rows.slice(written, written + PART_ROWS);
      written += part.length;
      const partPlan = await plan(part);
      totals.inserted += partPlan.inserts.length;
      totals.updated += partPlan.updates.length;
      totals.unchanged += partPlan.unchanged;
      totals.unmatched += partPlan.unmatched;
      if (inFlight) await inFlight;
      inFlight = applyPricePlan(manager, distributorId, partPlan, importId);
      // Observed at once so a failure is not reported as unhandled while the parse goes on.
      inFlight.catch(() => undefined);
    }
  };
  try {
    for (;;) {
      const step = steps.next();
      if (step.done) {
        if (step.value.rejected > 0) throw new RowsRejected(step.value);
        await writeParts(step.value.rows, true);
        if (inFlight) await inFlight;
        return { parsed: step.value, totals };
      }
      if (step.value.rejected > 0) throw new RowsRejected();
      await writeParts(step.value.rows, false);
      await nextTurn();
    }
  } catch (err) {
    // The transaction fails as a whole: let the write in flight settle before the caller rolls back.
    if (inFlight) await (inFlight as Promise<void>).catch(() => undefined);
    throw err;
  }
}

/** Reads the rest of a parse left at a rejected row, yielding to the event loop between slices. */
export async function finishParse(steps: Generator<ParseProgress, ParsedFile>): Promise<ParsedFile> {
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
    await nextTurn();
  }
}
