// tsconfig maps the bare specifier "odex" to types/odex.d.ts for type checking, and tsx and
// vitest follow that mapping at run time too, finding no code there. This file imports the
// package's compiled entry by its full path instead; TypeScript reads odex-runtime.d.ts beside
// it and never type-checks odex's own TypeScript source.
export { Solver } from 'odex/src/odex.js';
