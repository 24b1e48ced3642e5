import { describe, expect, it } from 'vitest';
import {
  applyPending,
  dropItem,
  enqueueCreate,
  enqueueReading,
  enqueueSave,
  keepMine,
  nextToSend,
  replay,
  waitingCount,
  type OutboxItem,
  type SendOutcome,
  type TheirRecord,
} from '../../hooks/record-outbox-queue';
import type { ChecklistRow } from '../../shared/checklist';

let n = 0;
const meta = () => ({ id: `item-${++n}`, at: '2026-12-02T09:00:00.000Z' });
const row = (id: string, state: ChecklistRow['state'] = 'open'): ChecklistRow => ({ id, title: id, reason: 'because', state }) as ChecklistRow;
const theirs = (latestRevision: number, status: 'draft' | 'final' = 'draft'): TheirRecord => ({
  latestRevision,
  status,
  serials: { outdoor: 'THEIRS-1' },
  checklist: [row('filter-drier', 'done')],
});
const reading = { label: 'After adjustment', evacuation: { finalMicrons: 450 } };

/** A fake server: answers each item in turn from `answers` and records what it was sent. */
function fakeServer(answers: ((item: OutboxItem) => SendOutcome)[]) {
  let kept: OutboxItem[] = [];
  const sent: OutboxItem[] = [];
  return {
    set: (items: OutboxItem[]) => (kept = items),
    get: () => kept,
    sent,
    run: () =>
      replay(
        () => kept,
        (items) => (kept = items),
        async (item) => {
          sent.push(item);
          return (answers.shift() ?? (() => ({ ok: true }) as SendOutcome))(item);
        },
      ),
  };
}

describe('queueing record changes with no signal', () => {
  it('when two saves of one record wait, then they fold into one from the first revision, serials and checklist merged by key', () => {
    let items: OutboxItem[] = [];
    items = enqueueSave(items, { systemId: 7, baseRevision: 3, asNewRevision: false, change: { serials: { outdoor: 'A1' } } }, meta());
    items = enqueueSave(items, { systemId: 7, baseRevision: 3, asNewRevision: false, change: { checklist: { 'filter-drier': { state: 'done' } } } }, meta());
    items = enqueueSave(items, { systemId: 7, baseRevision: 3, asNewRevision: false, change: { serials: { indoorCoil: 'C2' } } }, meta());
    items = enqueueReading(items, 7, reading, meta());
    expect(items).toHaveLength(2);
    expect(items[0]).toMatchObject({
      kind: 'save',
      baseRevision: 3,
      edits: 3,
      change: { serials: { outdoor: 'A1', indoorCoil: 'C2' }, checklist: { 'filter-drier': { state: 'done' } } },
    });
    // Three edits and one reading: "4 changes waiting for signal".
    expect(waitingCount(items, 7)).toBe(4);
    expect(waitingCount(items, 8)).toBe(0);
  });

  it('when a save is on its way, then a new one is not folded into it (it would be lost when the first lands)', () => {
    const first = enqueueSave([], { systemId: 7, baseRevision: 3, asNewRevision: false, change: { label: 'Attic' } }, meta());
    const next = enqueueSave(first, { systemId: 7, baseRevision: 3, asNewRevision: false, change: { label: 'Attic unit' } }, meta(), first[0].id);
    expect(next).toHaveLength(2);
  });

  it('when the record is shown, then waiting serials and checklist states show over the server’s', () => {
    const items = enqueueSave([], { systemId: 7, baseRevision: 3, asNewRevision: false, change: { serials: { outdoor: 'A1' }, checklist: { 'condensate-trap': { state: 'not-applicable', note: 'Pump' } } } }, meta());
    const shown = applyPending({ id: 7, serials: { outdoor: 'OLD', indoorCoil: 'C0' }, checklist: [row('filter-drier'), row('condensate-trap')] }, items);
    expect(shown.serials).toEqual({ outdoor: 'A1', indoorCoil: 'C0' });
    expect(shown.checklist.map((r) => [r.state, r.note])).toEqual([
      ['open', undefined],
      ['not-applicable', 'Pump'],
    ]);
    const other = { id: 8, serials: {}, checklist: [] };
    expect(applyPending(other, items)).toBe(other);
  });
});

describe('sending when the signal returns', () => {
  it('when everything lands, then items go in order and a later save on top of ours moves to the revision ours made', async () => {
    const server = fakeServer([() => ({ ok: true, record: { latestRevision: 4 } })]);
    let items: OutboxItem[] = enqueueSave([], { systemId: 7, baseRevision: 3, asNewRevision: true, change: { serials: { outdoor: 'A1' } } }, meta());
    items = enqueueReading(items, 7, reading, meta());
    // Saved while the first was on its way, from the same revision the screen still showed.
    items = [...items, { kind: 'save', id: 'late', queuedAt: 'x', systemId: 7, baseRevision: 3, asNewRevision: true, change: { label: 'x' }, edits: 1 }];
    server.set(items);
    expect(await server.run()).toBe('done');
    expect(server.sent.map((i) => i.kind)).toEqual(['save', 'reading', 'save']);
    expect(server.sent[2]).toMatchObject({ id: 'late', baseRevision: 4, asNewRevision: false });
    expect(server.get()).toEqual([]);
  });

  it('when a save meets a newer revision, then it is held as a conflict with theirs, later items of that record wait, other records go on', async () => {
    const server = fakeServer([() => ({ ok: false, conflict: theirs(5, 'final') })]);
    let items: OutboxItem[] = enqueueSave([], { systemId: 7, baseRevision: 3, asNewRevision: false, change: { serials: { outdoor: 'A1' } } }, meta());
    items = enqueueReading(items, 7, reading, meta());
    items = enqueueCreate(items, 2, { scope: 'new-system', outdoor: { id: 1 } } as never, 'check saved', meta());
    items = enqueueReading(items, 9, reading, meta());
    server.set(items);
    expect(await server.run()).toBe('done');
    expect(server.sent.map((i) => `${i.kind}`)).toEqual(['save', 'create', 'reading']);
    const left = server.get();
    expect(left).toHaveLength(2);
    expect(left[0].problem).toEqual({ kind: 'conflict', theirs: theirs(5, 'final') });
    expect(nextToSend(left)).toBeUndefined();

    // "Keep mine": re-based on revision 5; theirs is final, so the change goes as a new revision.
    const kept = keepMine(left, left[0].id);
    expect(kept[0]).toMatchObject({ baseRevision: 5, asNewRevision: true });
    expect(kept[0].problem).toBeUndefined();
    expect(nextToSend(kept)?.id).toBe(left[0].id);
    // "Take theirs": the change is dropped and the reading may go.
    expect(nextToSend(dropItem(left, left[0].id))?.kind).toBe('reading');
  });

  it('when the signal drops again mid-way, then sending stops and nothing is lost', async () => {
    const server = fakeServer([() => ({ ok: true }), () => ({ ok: false, retryLater: true })]);
    let items: OutboxItem[] = enqueueReading([], 7, reading, meta());
    items = enqueueReading(items, 7, { ...reading, label: 'Second' }, meta());
    items = enqueueReading(items, 7, { ...reading, label: 'Third' }, meta());
    server.set(items);
    expect(await server.run()).toBe('retry-later');
    expect(server.get().map((i) => (i.kind === 'reading' ? i.body.label : ''))).toEqual(['Second', 'Third']);
    expect(server.get().every((i) => !i.problem)).toBe(true);
  });

  it('when the server refuses an item, then it is held with the words why and later items of its record wait', async () => {
    const server = fakeServer([() => ({ ok: false, refused: 'This record is final: start a new revision to add readings.' })]);
    let items: OutboxItem[] = enqueueReading([], 7, reading, meta());
    items = enqueueReading(items, 7, { ...reading, label: 'Second' }, meta());
    server.set(items);
    await server.run();
    expect(server.sent).toHaveLength(1);
    expect(server.get()[0].problem).toEqual({ kind: 'refused', message: 'This record is final: start a new revision to add readings.' });
  });
});
