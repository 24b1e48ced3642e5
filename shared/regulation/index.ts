// Sources: 40 CFR Part 82 (R-22: 74 FR 66450, 85 FR 15258) and 40 CFR 84.54 (AIM Act technology
// transitions: 88 FR 73098, 88 FR 88825); see transition-rules.ts for each rule's source.
export { DEFAULT_TRANSITION_RULES, AIM_GWP_LIMIT, refrigerantsOverGwpLimit } from './transition-rules';
export { applicableTransitions, latestManufactureDate, type TransitionOutcome } from './evaluate-transitions';
