import psychrolib from 'psychrolib';

// Source: psychrolib (a general-purpose implementation of the ASHRAE Handbook—Fundamentals 2017 ch. 1
// psychrometric equations). psychrolib keeps one global unit system, so every call sets IP first:
// another module may have switched it to SI.

export class PsychrometricInputError extends Error {
  constructor(
    readonly field: 'dryBulbF' | 'rhPct' | 'altitudeFt',
    message: string,
  ) {
    super(message);
    this.name = 'PsychrometricInputError';
  }
}

/** Wet-bulb temperature in °F from dry bulb in °F and relative humidity in % at an altitude in ft (standard atmosphere). */
export function wetBulbF(dryBulbF: number, rhPct: number, altitudeFt = 0): number {
  if (!Number.isFinite(dryBulbF) || dryBulbF < -148 || dryBulbF > 392) throw new PsychrometricInputError('dryBulbF', 'dry bulb must be between −148 °F and 392 °F');
  if (!Number.isFinite(rhPct) || rhPct <= 0 || rhPct > 100) throw new PsychrometricInputError('rhPct', 'relative humidity must be above 0 % and at most 100 %');
  if (!Number.isFinite(altitudeFt) || altitudeFt < -1500 || altitudeFt > 30000) throw new PsychrometricInputError('altitudeFt', 'altitude must be between −1,500 ft and 30,000 ft');
  psychrolib.SetUnitSystem(psychrolib.IP);
  const psia = psychrolib.GetStandardAtmPressure(altitudeFt);
  return psychrolib.GetTWetBulbFromRelHum(dryBulbF, rhPct / 100, psia);
}
