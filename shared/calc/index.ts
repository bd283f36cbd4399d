// The trade computations, in one import: `import { displacement, specCheck } from '@shared/calc'`.
export * from './errors';
export * from './units';
export * from './format';
export * from './precision';
export * from './figure';
export * from './engine';
export * from './tyres';
export * from './gearing';
export * from './power';
export * from './wheels';
export * from './suspension';
export * from './four-link';
export * from './tubes';
export * from './corner-weights';
export * from './spec-check-rules';
export * from './safety';
