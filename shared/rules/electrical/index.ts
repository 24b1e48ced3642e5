import type { Rule } from '../types';
import { breakerNonstandard } from './breaker-nonstandard';
import { breakerOverMocp } from './breaker-over-mocp';
import { breakerUnderMca } from './breaker-under-mca';
import { disconnect } from './disconnect';
import { heatKitCircuit } from './heat-kit-circuit';
import { overcurrentType } from './overcurrent-type';
import { voltageMismatch } from './voltage-mismatch';
import { wireAmpacity } from './wire-ampacity';

/** The electrical family, one rule per file named by its id. */
export const electricalRules: Rule[] = [breakerOverMocp, breakerUnderMca, breakerNonstandard, wireAmpacity, disconnect, overcurrentType, voltageMismatch, heatKitCircuit];
