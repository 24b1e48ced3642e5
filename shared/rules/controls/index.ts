import type { Rule } from '../types';
import { heatPumpThermostat } from './heat-pump-thermostat';

export const controlsRules: Rule[] = [heatPumpThermostat];
