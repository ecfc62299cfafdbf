/** The compatibility model (compat-model.md): pure functions, SI inside, trade units at the edge. */
export * from './types';
export * from './errors';
export * from './settings';
export * from './paschen';
export * from './cylinder-gas';
export * from './required-voltage';
export * from './primary-circuit';
export * from './coil-analysis';
export * from './coil-checks';
export * from './plug-checks';
export * from './bench-test';
export * from './rank';
export * from './check-labels';
