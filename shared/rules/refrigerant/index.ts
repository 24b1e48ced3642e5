import type { Rule } from '../types';
import { a2lChargeArea } from './a2l-charge-area';
import { a2lListing } from './a2l-listing';
import { coilListing } from './coil-listing';
import { meteringDevice } from './metering-device';
import { oilCompatibility } from './oil-compatibility';

/** The refrigerant family, one rule per file named by its id. */
export const refrigerantRules: Rule[] = [meteringDevice, coilListing, a2lListing, a2lChargeArea, oilCompatibility];
