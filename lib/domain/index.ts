/** The vocabulary at the bottom of every layer: plain TypeScript, importing nothing outside lib/domain. */
export * from './units';
export * from './roles';
export * from './register';
export * from './shapes';
export * from './quantity-rules';
export * from './ladder';
export * from './ids';
export * from './reference-energies';
export * from './default-ladder';
