import type { Rule } from '../types';
import { airHandlerRange } from './air-handler-range';
import { coilRange } from './coil-range';

export const capacityRules: Rule[] = [coilRange, airHandlerRange];
