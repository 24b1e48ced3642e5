import { describe, expect, it } from 'vitest';
import { BAR_LAYOUT, costBarsModel, niceStep } from '@/components/options/cost-bars-geometry';

describe('annual-cost bar chart geometry', () => {
  it('when the costs are $1,180 and $860 over a 316 px plot, then the axis tops out at $1,500 and the bars scale from zero', () => {
    // 332 px wide less 8 px each side = 316 px of plot. Tick step for a $1,180 span in about 4 ticks:
    // 295 → 500 (1-2-5 series, the usual "nice numbers" axis rule: common practice, no source).
    const model = costBarsModel(
      [
        { key: 'existing', label: 'Existing system', valueCents: 118_000 },
        { key: 'a', label: 'Heat pump, cased coil', valueCents: 86_000 },
      ],
      332,
    );
    expect(model.plot).toEqual({ left: 8, width: 316 });
    expect(model.ticks.map((t) => t.cents)).toEqual([0, 50_000, 100_000, 150_000]);
    // Length = dollars ÷ axis top × plot width (arithmetic): 1180/1500 × 316 = 248.59; 860/1500 × 316 = 181.17.
    expect(model.bars[0].barWidth).toBeCloseTo(248.59, 2);
    expect(model.bars[1].barWidth).toBeCloseTo(181.17, 2);
    expect(model.ticks[3].x).toBeCloseTo(8 + 316, 6);
  });

  it('when an option has no figure, then its bar is empty and the others still scale', () => {
    const model = costBarsModel(
      [
        { key: 'a', label: 'A', valueCents: null },
        { key: 'b', label: 'B', valueCents: 40_000 },
      ],
      216,
    );
    // $400 in about 4 ticks: step 100 (1-2-5 series), so the top is $400 and B fills the plot (arithmetic).
    expect(model.bars[0].barWidth).toBe(0);
    expect(model.bars[0].valueCents).toBeNull();
    expect(model.bars[1].barWidth).toBeCloseTo(200, 6);
  });

  it('when there are three rows, then each sits one row lower and the height leaves room for the axis', () => {
    const rowPx = BAR_LAYOUT.labelPx + BAR_LAYOUT.barPx + BAR_LAYOUT.gapPx;
    const model = costBarsModel(
      [1, 2, 3].map((n) => ({ key: String(n), label: String(n), valueCents: n * 10_000 })),
      300,
    );
    expect(model.bars.map((b) => b.barY)).toEqual([0, 1, 2].map((i) => i * rowPx + BAR_LAYOUT.labelPx));
    expect(model.heightPx).toBe(3 * rowPx + BAR_LAYOUT.axisPx);
  });

  it('when every cost is zero or missing, then the axis still has a span and nothing divides by zero', () => {
    const model = costBarsModel([{ key: 'a', label: 'A', valueCents: 0 }], 200);
    expect(model.bars[0].barWidth).toBe(0);
    expect(model.ticks.length).toBeGreaterThan(1);
    expect(model.ticks.every((t) => Number.isFinite(t.x))).toBe(true);
  });

  it('when asked for a step, then it follows the 1-2-5 series', () => {
    // Nice-number steps (common practice, no source): 73/5 = 14.6 → 20; 0.9/3 = 0.3 → 0.5; 1000/4 = 250 → 500.
    expect(niceStep(73, 5)).toBe(20);
    expect(niceStep(0.9, 3)).toBeCloseTo(0.5, 12);
    expect(niceStep(1000, 4)).toBe(500);
  });
});

describe('option words', async () => {
  const { centsFromText, differingKeys, moneyText } = await import('@/components/options/option-words');
  it('when cents are shown, then dollars with thousands separators (en-US number format, Intl)', () => {
    expect(moneyText(123_450)).toBe('$1,234.50');
    expect(moneyText(86_049, 0)).toBe('$860');
    expect(moneyText(-2_500)).toBe('−$25.00');
  });
  it('when a price is typed, then it becomes cents, and nonsense does not', () => {
    expect(centsFromText('$1,234.5')).toBe(123_450);
    expect(centsFromText('99')).toBe(9_900);
    expect(centsFromText('12.345')).toBeUndefined();
    expect(centsFromText('abc')).toBeUndefined();
  });
  it('when cards show the same text for a figure, then it is not marked; when any differs, it is', () => {
    const marked = differingKeys([
      { key: 'tax', label: 'Tax', values: ['7%', '7%', '7%'] },
      { key: 'price', label: 'Price', values: ['$9,000.00', '$9,000.00', '$11,250.00'] },
      { key: 'alone', label: 'Alone', values: ['x'] },
    ]);
    expect([...marked]).toEqual(['price']);
  });
});
