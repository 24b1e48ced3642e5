import type { Rule } from '../types';
import { refrigerantTransition } from './refrigerant-transition';

/** The regulation family, one rule per file named by its id. */
export const regulationRules: Rule[] = [refrigerantTransition];
