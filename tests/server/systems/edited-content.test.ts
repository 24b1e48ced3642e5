import { describe, expect, it } from 'vitest';
import { AppError } from '../../../server/lib/errors';
import { parseEditedContent, parseSystemCreate } from '../../../server/systems/system-validation';
import { recordBody } from './system-fixtures';

// Catalog ids are not looked up by validation; these stand in for the fixture's.
const body = (over: object = {}) => recordBody({ outdoorId: 11, coilId: 12, jobId: 1 }, over) as Record<string, unknown>;

/** The details of the 422 a parse throws. */
function refusal(parse: () => unknown): unknown {
  try {
    parse();
  } catch (err) {
    if (err instanceof AppError) return { status: err.status, details: err.details };
    throw err;
  }
  throw new Error('expected a validation failure');
}

describe('parseEditedContent (an edit of a record whose check part validated before)', () => {
  it('when only the serials, checklist or label change, then the content equals what the full validation gives', () => {
    parseEditedContent(body());
    for (const over of [
      { serials: { outdoor: ' QX2611A08001 ' } },
      { checklist: { 'filter-drier': { state: 'done' } } },
      { label: '  Upstairs ' },
      { serials: undefined, label: undefined },
    ]) {
      expect(parseEditedContent(body(over))).toEqual(parseSystemCreate(body(over)));
    }
  });

  it('when a known check part comes with a bad serial or a not-applicable item with no reason, then 422 at the same paths as the full validation', () => {
    parseEditedContent(body());
    for (const over of [{ serials: { outdoor: 'QX<b>1' } }, { checklist: { 'condensate-trap': { state: 'not-applicable' } } }]) {
      const edited = refusal(() => parseEditedContent(body(over)));
      expect(edited).toEqual(refusal(() => parseSystemCreate(body(over))));
      expect(edited).toMatchObject({ status: 422 });
    }
  });

  it('when the check part is invalid, then every edit of it is refused, not only the first', () => {
    const bad = body({ lineSet: { liquidOdIn: -1, suctionOdIn: 0.875, lengthFt: 25 } });
    expect(refusal(() => parseEditedContent(bad))).toMatchObject({ status: 422 });
    expect(refusal(() => parseEditedContent({ ...bad, serials: { outdoor: 'QX2611A08002' } }))).toMatchObject({ status: 422 });
  });
});
