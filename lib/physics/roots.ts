/**
 * Root of a continuous function bracketed by [lo, hi] with f(lo) and f(hi) of opposite sign
 * (or zero), by Newton steps kept inside the bracket and bisection when Newton would leave it.
 * `df` may be omitted, in which case the Illinois variant of regula falsi is used.
 */
export function bracketedRoot(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options: { df?: (x: number) => number; xTol?: number; fTol?: number; maxIter?: number } = {},
): number {
  const xTol = options.xTol ?? 0;
  const fTol = options.fTol ?? 0;
  const maxIter = options.maxIter ?? 200;
  let flo = f(lo);
  let fhi = f(hi);
  if (flo === 0) return lo;
  if (fhi === 0) return hi;
  let x = flo * fhi < 0 ? lo - (flo * (hi - lo)) / (fhi - flo) : 0.5 * (lo + hi);
  let side = 0;
  for (let i = 0; i < maxIter; i++) {
    const fx = f(x);
    if (Math.abs(fx) <= fTol) return x;
    if ((fx < 0) === (flo < 0)) {
      lo = x;
      flo = fx;
      if (side === -1) fhi *= 0.5;
      side = -1;
    } else {
      hi = x;
      fhi = fx;
      if (side === 1) flo *= 0.5;
      side = 1;
    }
    if (hi - lo <= xTol || hi - lo <= 4 * Number.EPSILON * Math.abs(x)) return x;
    let next = Number.NaN;
    if (options.df) {
      const d = options.df(x);
      if (d !== 0) next = x - fx / d;
    } else {
      next = lo - (flo * (hi - lo)) / (fhi - flo);
    }
    x = next > lo && next < hi ? next : 0.5 * (lo + hi);
  }
  return x;
}

/** Principal branch W₀ of the Lambert W function, for x ≥ −1/e (Halley's iteration). */
export function lambertW0(x: number): number {
  const minusInvE = -1 / Math.E;
  if (x < minusInvE) {
    if (x > minusInvE - 1e-15) return -1;
    throw new RangeError(`lambertW0 is not real below -1/e, got ${x}`);
  }
  if (x === 0) return 0;
  let w: number;
  if (x < -0.25) {
    // Series about the branch point, where Halley's iteration from a crude start is slow.
    const p = Math.sqrt(2 * (Math.E * x + 1));
    w = -1 + p - (p * p) / 3 + (11 * p * p * p) / 72;
  } else if (x < 3) {
    w = Math.log1p(x) * (1 - Math.log1p(Math.log1p(x)) / (2 + Math.log1p(x)));
  } else {
    const l = Math.log(x);
    w = l - Math.log(l);
  }
  for (let i = 0; i < 50; i++) {
    const e = Math.exp(w);
    const f = w * e - x;
    const wp1 = w + 1;
    if (wp1 === 0) break;
    const step = f / (e * wp1 - ((w + 2) * f) / (2 * wp1));
    w -= step;
    if (Math.abs(step) <= 1e-15 * (1 + Math.abs(w))) break;
  }
  return w;
}
