/**
 * Simpson's multipliers written as the trade writes them on a sheet: whole numbers and
 * mixed fractions (1, 4, 2, 1/2, 1 1/2, 2 1/8 ...), a decimal where the spacing is so
 * uneven that no small fraction fits. Common practice, no source.
 */

// The same denominators as the sheet's numbers (halves and quarters from halved end intervals, eighths from the 3/8 rule).
import { MULTIPLIER_DENOMINATORS as DENOMINATORS } from '../quadrature/cleanMultiplier.js';

/**
 * A multiplier as text.
 * @example multiplierText(1.5) // '1 1/2'
 * @example multiplierText(0.5) // '1/2'
 * @example multiplierText(-0.125) // '-1/8'
 * @example multiplierText(1.2345678) // '1.2346'
 */
export function multiplierText(m: number): string {
  if (!Number.isFinite(m)) return '-';
  const sign = m < 0 ? '-' : '';
  const a = Math.abs(m);
  for (const d of DENOMINATORS) {
    const num = Math.round(a * d);
    if (Math.abs(a * d - num) <= 1e-9 * Math.max(1, a * d)) {
      const whole = Math.floor(num / d);
      const rest = num - whole * d;
      if (rest === 0) return `${sign}${whole}`;
      return whole === 0 ? `${sign}${rest}/${d}` : `${sign}${whole} ${rest}/${d}`;
    }
  }
  return `${sign}${Number(a.toFixed(4))}`;
}
