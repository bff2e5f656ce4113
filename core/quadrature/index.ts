/** core/quadrature: Numerical rules on ordinates: Simpson's rules and their relatives as weights, Gauss-Legendre nodes, derivatives of tabulated values. It may import core/common/ only. */
export * from './derivative.js';
export * from './gauss.js';
export * from './simpson.js';
