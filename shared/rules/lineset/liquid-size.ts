import { lineSizeRule } from '../line-size-rule';

/** Liquid line OD against the sizes the outdoor unit allows (its connection size when no list is given). */
export const liquidSize = lineSizeRule({
  id: 'lineset.liquid-size',
  name: 'Liquid',
  installed: (line) => line.liquidOdIn,
  allowed: (outdoor) => outdoor.allowedLiquidOdIn ?? (outdoor.liquidLineOdIn !== undefined ? [outdoor.liquidLineOdIn] : undefined),
  valuesKey: 'liquidOdIn',
  smallFix: (nearest, at) =>
    `Replace with ${nearest} in, or confirm in the instructions that this size is allowed ${at} (a small liquid line loses subcooling to pressure drop).`,
  largeFix: (nearest) => `Replace with ${nearest} in, or confirm it is allowed; a larger liquid line holds more charge, so adjust the charge for it.`,
});
