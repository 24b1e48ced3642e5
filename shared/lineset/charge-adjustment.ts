import { liquidLineOzPerFt, tubeContentRatio } from './liquid-content';
import { formatLineSize, sameLineSize } from './tube-sizes';

/**
 * Line length the factory charge covers when the unit does not say: 15 ft, common practice
 * (no source) — values.json LS-03.
 */
export const DEFAULT_CHARGED_LINE_LENGTH_FT = 15;

export interface ChargeAdjustmentInput {
  refrigerant: string;
  /** Installed liquid line OD, in. */
  liquidOdIn: number;
  /** Installed line length, ft. */
  lengthFt: number;
  /** Length the factory charge covers, ft (default 15). */
  chargedLineLengthFt?: number;
  /** The outdoor unit's own oz/ft figure; it applies to the unit's own liquid connection size. */
  unitChargePerFtOz?: number;
  /** The outdoor unit's liquid connection OD, in. */
  unitLiquidOdIn?: number;
}

export type ChargeAdjustmentMethod = 'unit' | 'unit-scaled' | 'tube-content';

export interface ChargeAdjustment {
  /** Ounces to add (positive) or remove (negative). */
  ounces: number;
  ozPerFt: number;
  chargedLineLengthFt: number;
  chargedLengthAssumed: boolean;
  method: ChargeAdjustmentMethod;
  /** Bore-area ratio applied to the unit's figure ('unit-scaled' only). */
  scaleRatio?: number;
}

/**
 * Charge adjustment, oz = (actual − charged length, ft) × oz/ft for the installed liquid size.
 * The unit's own oz/ft wins for its own connection size; for another size it is scaled by the bore
 * area ratio; with no unit figure the liquid-full content of the tube is used. Undefined when no
 * figure can be found (unknown refrigerant or non-standard tube).
 */
export function chargeAdjustment(input: ChargeAdjustmentInput): ChargeAdjustment | undefined {
  const chargedLineLengthFt = input.chargedLineLengthFt ?? DEFAULT_CHARGED_LINE_LENGTH_FT;
  const chargedLengthAssumed = input.chargedLineLengthFt === undefined;
  const unitOz = input.unitChargePerFtOz;
  let ozPerFt: number | undefined;
  let method: ChargeAdjustmentMethod;
  let scaleRatio: number | undefined;
  if (unitOz !== undefined && (input.unitLiquidOdIn === undefined || sameLineSize(input.unitLiquidOdIn, input.liquidOdIn))) {
    ozPerFt = unitOz;
    method = 'unit';
  } else if (unitOz !== undefined && input.unitLiquidOdIn !== undefined && (scaleRatio = tubeContentRatio(input.liquidOdIn, input.unitLiquidOdIn)) !== undefined) {
    ozPerFt = unitOz * scaleRatio;
    method = 'unit-scaled';
  } else {
    ozPerFt = liquidLineOzPerFt(input.refrigerant, input.liquidOdIn);
    method = 'tube-content';
  }
  if (ozPerFt === undefined) return undefined;
  return { ounces: (input.lengthFt - chargedLineLengthFt) * ozPerFt, ozPerFt, chargedLineLengthFt, chargedLengthAssumed, method, scaleRatio };
}

/** Where an adjustment's oz/ft came from, in words (for a finding's detail). */
export function chargeAdjustmentSource(adj: ChargeAdjustment, input: ChargeAdjustmentInput): string {
  const size = formatLineSize(input.liquidOdIn);
  if (adj.method === 'unit') return `the unit's figure for a ${size} in liquid line`;
  if (adj.method === 'unit-scaled') {
    return `the unit's ${round2(input.unitChargePerFtOz ?? 0)} oz/ft for its ${formatLineSize(input.unitLiquidOdIn ?? 0)} in connection, scaled ×${round2(adj.scaleRatio ?? 1)} by tube bore for the ${size} in line installed`;
  }
  return `the liquid-full content of ${size} in tube for ${input.refrigerant} at 90 °F`;
}

function round2(x: number): number {
  return Math.round(x * 100) / 100;
}
