// Types for the parts of psychrolib (ASHRAE Handbook—Fundamentals ch. 1 formulas) that Tandem uses.
declare module 'psychrolib' {
  interface Psychrolib {
    IP: number;
    SI: number;
    SetUnitSystem(units: number): void;
    GetUnitSystem(): number;
    /** Wet bulb in °F [IP] from dry bulb in °F, relative humidity 0–1 and pressure in psia. */
    GetTWetBulbFromRelHum(dryBulb: number, relHum: number, pressure: number): number;
    /** Dew point in °F [IP] from dry bulb in °F and relative humidity 0–1. */
    GetTDewPointFromRelHum(dryBulb: number, relHum: number): number;
    /** Standard-atmosphere pressure in psia [IP] at an altitude in ft. */
    GetStandardAtmPressure(altitude: number): number;
  }
  const psychrolib: Psychrolib;
  export = psychrolib;
}
