import type { Pairing } from '../../shared/rules/types';
import type { CommissioningEvaluateResult } from '../../shared/schemas/commissioning';
import type { SystemCreate } from '../../shared/schemas/systems';
import type { CurrentPrice } from '../catalog/prices.service';

/** What the tech gave for a revision: the check body, serials, label and checklist states. */
export type RecordContent = SystemCreate;

/** The pairing as resolved at save time (part specs as they stood), without the rated-combination list. */
export type ResolvedParts = Omit<Pairing, 'ratedCombinations'>;

export type PartSlot = 'outdoor' | 'indoorCoil' | 'airHandler' | 'metering';
export const PART_SLOTS: PartSlot[] = ['outdoor', 'indoorCoil', 'airHandler', 'metering'];

/** The best current price of each catalog part when the revision was saved (date is ISO, prices in cents). */
export interface PriceSnapshot {
  asOf: string;
  parts: Partial<Record<PartSlot, CurrentPrice>>;
  totalCents?: number;
}

/** What was computed from one reading: charge figures, and pass/fail of evacuation and nitrogen test. */
export interface ReadingResults {
  charge?: CommissioningEvaluateResult;
  /** `passed` null: not enough recorded to judge (the message says what is missing). */
  evacuation?: { passed: boolean | null; message: string };
  pressureTest?: { passed: boolean | null; message: string };
}
