export * from './tube-sizes';
export * from './liquid-content';
export * from './charge-adjustment';
export * from './size-check';
export * from './fittings';
