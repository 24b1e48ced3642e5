import { lineSizeRule } from '../line-size-rule';

/** Suction (vapor) line OD against the sizes the outdoor unit allows (its connection size when no list is given). */
export const suctionSize = lineSizeRule({
  id: 'lineset.suction-size',
  name: 'Suction',
  installed: (line) => line.suctionOdIn,
  allowed: (outdoor) => outdoor.allowedSuctionOdIn ?? (outdoor.suctionLineOdIn !== undefined ? [outdoor.suctionLineOdIn] : undefined),
  valuesKey: 'suctionOdIn',
  smallFix: (nearest, at) => `Replace with ${nearest} in, or confirm the capacity loss the instructions give for this size ${at}.`,
  largeFix: (nearest) => `Replace with ${nearest} in, or confirm it is allowed: an oversize suction line slows the vapor and oil may not return on risers.`,
});
