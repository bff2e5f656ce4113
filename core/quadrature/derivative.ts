/**
 * Derivative at the middle of three unevenly spaced ordinates, from the parabola through
 * them (exact for quadratics); one-sided or zero where neighbours are missing (NaN).
 * Reference: B. Fornberg, "Generation of finite difference formulas on arbitrarily
 * spaced grids", Mathematics of Computation 51 (1988) 699-706.
 */
export function derivative3(xa: number, ya: number, x0: number, y0: number, xb: number, yb: number): number {
  const hasA = Number.isFinite(ya);
  const hasB = Number.isFinite(yb);
  if (hasA && hasB) {
    const h1 = x0 - xa;
    const h2 = xb - x0;
    return (-h2 / (h1 * (h1 + h2))) * ya + ((h2 - h1) / (h1 * h2)) * y0 + (h1 / (h2 * (h1 + h2))) * yb;
  }
  if (hasA) return (y0 - ya) / (x0 - xa);
  if (hasB) return (yb - y0) / (xb - x0);
  return 0;
}
