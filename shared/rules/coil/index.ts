import type { Rule } from '../types';
import { material } from './material';

export const coilRules: Rule[] = [material];
