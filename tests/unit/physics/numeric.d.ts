// Minimal types for numeric 1.2.6, used only as an independent integrator in tests.
declare module 'numeric' {
  interface DopriSolution {
    x: number[];
    y: number[][];
    at(x: number): number[];
    events?: boolean | boolean[];
  }
  const numeric: {
    dopri(
      x0: number,
      x1: number,
      y0: number[],
      f: (x: number, y: number[]) => number[],
      tol?: number,
      maxit?: number,
      event?: (x: number, y: number[]) => number | number[],
    ): DopriSolution;
  };
  export default numeric;
}
