import type { Rule } from '../types';
import { overflowProtection } from './overflow-protection';

export const condensateRules: Rule[] = [overflowProtection];
