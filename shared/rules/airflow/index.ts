import type { Rule } from '../types';
import { perTon } from './per-ton';

export const airflowRules: Rule[] = [perTon];
