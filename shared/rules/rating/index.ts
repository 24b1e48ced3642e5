import type { Rule } from '../types';
import { noRatedCombination } from './no-rated-combination';
import { ratedCombination } from './rated-combination';

export const ratingRules: Rule[] = [noRatedCombination, ratedCombination];
