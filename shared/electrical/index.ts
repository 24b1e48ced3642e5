// Sources: NEC 240.6(A) (standard ratings), NEC Table 310.16 (ampacity), NEC 110.14(C) (terminal
// temperature), NEC 240.4(D)/(G) and Article 440 (A/C circuits: MCA, MOCP).
export { STANDARD_BREAKER_AMPS, ADDITIONAL_FUSE_AMPS, isStandardBreaker, standardBreakersBetween, standardBreakerAtOrAbove, standardBreakerAtOrBelow } from './standard-ratings';
export { conductorAmpacity, conductorColumnC, terminalColumnC, SMALL_CONDUCTOR_MAX_OCPD_AMPS, ARTICLE_440_NOTE, type ConductorMaterial, type TemperatureColumnC } from './ampacity';
export { minimumCircuitAmpacity, maximumOvercurrentProtection, mocpRawAmps, type MotorLoads } from './circuit';
export { DEFAULT_HEAT_KIT_RATED_V, nameplateVoltageRange, heaterOutputKw, VOLTAGE_TOLERANCE, type VoltageRange } from './voltage';
