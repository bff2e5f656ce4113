/**
 * Five-point Gauss-Legendre quadrature on [0, 1]: exact for polynomials up to degree 9,
 * which covers every polynomial integrand of a section piece (a cubic times a cubic
 * times a quadratic). Nodes and weights: M. Abramowitz & I. A. Stegun, Handbook of
 * Mathematical Functions (Dover, 1965), table 25.4, mapped from [-1, 1] to [0, 1].
 */
const S = Math.sqrt(10 / 7);
const A = Math.sqrt(5 - 2 * S) / 3;
const B = Math.sqrt(5 + 2 * S) / 3;
const WA = (322 + 13 * Math.sqrt(70)) / 900;
const WB = (322 - 13 * Math.sqrt(70)) / 900;

export const GL5_T = Float64Array.of(0.5 - B / 2, 0.5 - A / 2, 0.5, 0.5 + A / 2, 0.5 + B / 2);
export const GL5_W = Float64Array.of(WB / 2, WA / 2, 128 / 450, WA / 2, WB / 2);
