import { describe, expect, it } from 'vitest';
import { waitingBanner, waitingItemText } from '../../components/systems/waiting-words';

describe('words for changes kept on the phone', () => {
  it('when changes wait with no signal, then the banner counts them in plain words', () => {
    expect(waitingBanner(1, { online: false, sending: false, held: false })).toMatch(/^1 change waiting for signal\./);
    expect(waitingBanner(2, { online: false, sending: false, held: false })).toMatch(/^2 changes waiting for signal\./);
    expect(waitingBanner(2, { online: true, sending: true, held: false })).toBe('Sending 2 changes…');
    expect(waitingBanner(1, { online: true, sending: false, held: true })).toContain('choose below');
  });

  it('when a folded save and a reading wait, then each says what it holds and that it is not yet sent', () => {
    const save = {
      kind: 'save' as const,
      id: 'a',
      queuedAt: 'x',
      systemId: 1,
      baseRevision: 3,
      asNewRevision: false,
      edits: 2,
      change: { serials: { outdoor: 'A', indoorCoil: 'B' }, checklist: { 'filter-drier': { state: 'done' as const } } },
    };
    expect(waitingItemText(save)).toBe('2 serial numbers and a checklist item from revision 3 (not yet sent)');
    expect(waitingItemText({ kind: 'reading', id: 'b', queuedAt: 'x', systemId: 1, body: { label: 'After adjustment', evacuation: { finalMicrons: 450 } } })).toBe(
      'Reading: After adjustment (not yet sent)',
    );
  });
});
