// The odex package ships its TypeScript source, which fails strict type checking; this
// declaration describes only the surface Plumbline uses (odex 2.0.4).
declare module 'odex' {
  export type Derivative = (x: number, y: number[]) => number[];

  /**
   * Called after every accepted step, and once before the first step without `dense`.
   * `dense(component, x)` interpolates within [xOld, x]. Return false to stop.
   */
  export type OutputFunction = (
    nr: number,
    xOld: number,
    x: number,
    y: number[],
    dense?: (component: number, x: number) => number,
  ) => boolean | void;

  export interface SolveResult {
    y: number[];
    /** 0 converged, 1 maximum steps exceeded, 2 stopped by the output function. */
    outcome: 0 | 1 | 2;
    nStep: number;
    xEnd: number;
    nAccept: number;
    nReject: number;
    nEval: number;
  }

  export class Solver {
    constructor(n: number);
    n: number;
    maxSteps: number;
    initialStepSize: number;
    maxStepSize: number;
    maxExtrapolationColumns: number;
    stepSizeSequence: number;
    denseOutput: boolean;
    denseComponents: number[] | undefined;
    interpolationFormulaDegree: number;
    relativeTolerance: number | number[];
    absoluteTolerance: number | number[];
    debug: boolean;
    solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): SolveResult;
    grid(dt: number, out: (xOut: number, yOut: number[]) => unknown): OutputFunction;
  }
}
