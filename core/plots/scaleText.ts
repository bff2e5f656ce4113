/** Units as a reader writes them, and the round scales of curves that share a sheet. */

const SUPERSCRIPT: Record<string, string> = { m2: 'm²', m3: 'm³', m4: 'm⁴', 't.m/cm': 't·m/cm', 't/m3': 't/m³', 'm.rad': 'm·rad', '-': '' };

/** A unit of the field tables (`m3`, `t.m/cm`, `-`) as printed (`m³`, `t·m/cm`, nothing for a coefficient). */
export function unitText(unit: string): string {
  return SUPERSCRIPT[unit] ?? unit;
}

/** The smallest of 1, 2, 2.5, 5 times a power of ten that is at least `raw` (> 0): a scale a reader can count in. */
export function roundStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const p = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= raw * (1 - 1e-12)) return m * p;
  return 10 * p;
}

/** A number for a label: up to `digits` significant digits, no trailing zeros. */
export function short(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return '-';
  return String(Number(v.toPrecision(digits)));
}
