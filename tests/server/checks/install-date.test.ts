import { afterEach, describe, expect, it, vi } from 'vitest';
import { today } from '../../../server/checks/checks.service';

// The default install date is the UTC calendar date (ISO 8601, YYYY-MM-DD); today() keeps the string
// for the rest of the UTC day, so these tests move the clock across midnight both ways.
describe('default install date', () => {
  afterEach(() => {
    vi.useRealTimers();
  });

  it('when the clock passes midnight UTC, then the date moves to the next day', () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-03-31T23:59:59.999Z'));
    expect(today()).toBe('2026-03-31');
    vi.setSystemTime(new Date('2026-04-01T00:00:00.000Z'));
    expect(today()).toBe('2026-04-01');
  });

  it('when the clock is set back a day, then the date follows it back', () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-02T12:00:00Z'));
    expect(today()).toBe('2026-12-02');
    vi.setSystemTime(new Date('2026-12-01T23:00:00Z'));
    expect(today()).toBe('2026-12-01');
  });

  it('when a date is given, then it is that date in UTC', () => {
    expect(today(new Date('2025-02-28T23:30:00-05:00'))).toBe('2025-03-01');
  });
});
