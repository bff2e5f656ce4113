/**
 * Reading stops early at the size limits: a grid whose defined cells are over the points
 * limit (core/common/limits.ts) is refused before its cells are parsed. The probe of
 * 2026-12-02 sent a 10 MB grid over the limit and waited 6 s for the refusal.
 */
import { describe, expect, test } from 'vitest';
import { isHalfbreadthError } from '../../core/common/errors.js';
import { LIMITS } from '../../core/common/limits.js';
import { readOffsetsCsv } from '../../core/offsets/readOffsets.js';

describe('a grid over the points limit', () => {
  test('is refused naming the limit, within a second (before its cells are parsed)', () => {
    const stations = 2600;
    const waterlines = 1000; // 2,600,000 defined cells: over 2,500,000
    const header = `x,${Array.from({ length: waterlines }, (_, j) => j).join(',')}`;
    const row = Array.from({ length: waterlines }, () => '1').join(',');
    const text = [header, ...Array.from({ length: stations }, (_, i) => `${i},${row}`)].join('\n');
    expect(stations * waterlines).toBeGreaterThan(LIMITS.maxPoints);
    const t0 = performance.now();
    let error: unknown;
    try {
      readOffsetsCsv(text);
    } catch (e) {
      error = e;
    }
    // A bound on the defect (seconds of parsing before), with room for a busy machine.
    expect(performance.now() - t0).toBeLessThan(1000);
    expect(isHalfbreadthError(error)).toBe(true);
    const issue = (error as { issues: { code: string; message: string }[] }).issues[0]!;
    expect(issue.code).toBe('HYD_TOO_LARGE');
    expect(issue.message).toContain(`the limit is ${LIMITS.maxPoints} points`);
  });
});
