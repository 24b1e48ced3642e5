import type { Rule } from '../types';
import { capacityRange } from './capacity-range';
import { heatPumpBidirectional } from './heat-pump-bidirectional';
import { pistonSize } from './piston-size';
import { startAssist } from './start-assist';
import { typeRequired } from './type-required';

export const meteringRules: Rule[] = [typeRequired, pistonSize, heatPumpBidirectional, capacityRange, startAssist];
