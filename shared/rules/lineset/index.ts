import type { Rule } from '../types';
import { chargeAdjustment } from './charge-adjustment';
import { filterDrier } from './filter-drier';
import { length } from './length';
import { lift } from './lift';
import { liquidSize } from './liquid-size';
import { longLine } from './long-line';
import { reuseCondition } from './reuse-condition';
import { suctionSize } from './suction-size';

export const linesetRules: Rule[] = [liquidSize, suctionSize, length, longLine, chargeAdjustment, lift, filterDrier, reuseCondition];
