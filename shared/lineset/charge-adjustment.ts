import { liquidLineOzPerFt, tubeContentRatio } from './liquid-content';
import { formatLineSize, sameLineSize } from './tube-sizes';

/**
 * Line length the factory charge covers when the unit does not say: 15 ft, common practice
 * (no source) — values.json LS-03.
 */
export const DEFAULT_CHARGED_LINE_LENGTH_FT = 15;

export interface ChargeAdjustmentInput {
  refrigerant: string;
  /** Installed liquid line OD, in; when not given, the unit's own liquid size is assumed. */
  liquidOdIn?: number;
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
  /** oz/ft of the installed liquid size. */
  ozPerFt: number;
  /** oz/ft of the unit's own liquid size (what the factory charge was put in for). */
  unitOzPerFt: number;
  chargedLineLengthFt: number;
  chargedLengthAssumed: boolean;
  /** True when the installed liquid size was not given and the unit's own size was assumed. */
  liquidSizeAssumed: boolean;
  method: ChargeAdjustmentMethod;
  /** Bore-area ratio applied to the unit's figure ('unit-scaled' only). */
  scaleRatio?: number;
}

/**
 * Charge adjustment, oz = installed length (ft) × oz/ft of the installed liquid size − charged
 * length (ft) × oz/ft of the unit's own liquid size (DESIGN §4). The unit's own oz/ft is for its
 * own connection size; another size scales it by the bore-area ratio (ASTM B280 bores); with no
 * unit figure the liquid-full content of each tube is used. With equal sizes this reduces to
 * (installed − charged) × oz/ft. Undefined when no figure can be found.
 */
export function chargeAdjustment(input: ChargeAdjustmentInput): ChargeAdjustment | undefined {
  const chargedLineLengthFt = input.chargedLineLengthFt ?? DEFAULT_CHARGED_LINE_LENGTH_FT;
  const chargedLengthAssumed = input.chargedLineLengthFt === undefined;
  const liquidSizeAssumed = input.liquidOdIn === undefined;
  const installedIn = input.liquidOdIn ?? input.unitLiquidOdIn;
  // The unit's size is the installed size when the unit does not give one (its figure then applies as is).
  const unitIn = input.unitLiquidOdIn ?? installedIn;
  const unitOz = input.unitChargePerFtOz;
  let ozPerFt: number | undefined;
  let unitOzPerFt: number | undefined;
  let method: ChargeAdjustmentMethod;
  let scaleRatio: number | undefined;
  if (unitOz !== undefined && (installedIn === undefined || unitIn === undefined || sameLineSize(unitIn, installedIn))) {
    ozPerFt = unitOz;
    unitOzPerFt = unitOz;
    method = 'unit';
  } else if (unitOz !== undefined && installedIn !== undefined && unitIn !== undefined && (scaleRatio = tubeContentRatio(installedIn, unitIn)) !== undefined) {
    ozPerFt = unitOz * scaleRatio;
    unitOzPerFt = unitOz;
    method = 'unit-scaled';
  } else {
    if (installedIn === undefined) return undefined;
    ozPerFt = liquidLineOzPerFt(input.refrigerant, installedIn);
    unitOzPerFt = unitIn === undefined ? undefined : liquidLineOzPerFt(input.refrigerant, unitIn);
    method = 'tube-content';
  }
  if (ozPerFt === undefined || unitOzPerFt === undefined) return undefined;
  const ounces = input.lengthFt * ozPerFt - chargedLineLengthFt * unitOzPerFt;
  return { ounces, ozPerFt, unitOzPerFt, chargedLineLengthFt, chargedLengthAssumed, liquidSizeAssumed, method, scaleRatio };
}

/** Where an adjustment's oz/ft came from, in words (for a finding's detail). */
export function chargeAdjustmentSource(adj: ChargeAdjustment, input: ChargeAdjustmentInput): string {
  const size = formatLineSize(input.liquidOdIn ?? input.unitLiquidOdIn ?? 0);
  const assumed = adj.liquidSizeAssumed ? ' (the installed liquid size is not given: the unit\'s own size is assumed)' : '';
  if (adj.method === 'unit') return `the unit's figure for ${input.liquidOdIn === undefined && input.unitLiquidOdIn === undefined ? 'its own liquid line' : `a ${size} in liquid line`}${assumed}`;
  if (adj.method === 'unit-scaled') {
    return `the unit's ${round2(input.unitChargePerFtOz ?? 0)} oz/ft for its ${formatLineSize(input.unitLiquidOdIn ?? 0)} in connection, scaled ×${round2(adj.scaleRatio ?? 1)} by tube bore for the ${size} in line installed`;
  }
  return `the liquid-full content of ${size} in tube for ${input.refrigerant} at 90 °F${assumed}`;
}

function round2(x: number): number {
  return Math.round(x * 100) / 100;
}
