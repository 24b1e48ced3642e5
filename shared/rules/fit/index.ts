import type { Rule } from '../types';
import { coilCabinet } from './coil-cabinet';
import { coilOrientation } from './coil-orientation';

export const fitRules: Rule[] = [coilOrientation, coilCabinet];
