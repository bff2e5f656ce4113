/**
 * Drafts lists as typed on the command line or in a query: values and inclusive ranges
 * `from:step:to`. The expected lists are worked out by hand from the definition of an
 * inclusive arithmetic range (count = (to - from) / step + 1); none is taken from the code.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { parseDraftList } from '../../core/common/draftList.js';
import { HalfbreadthError } from '../../core/common/errors.js';
import { LIMITS } from '../../core/common/limits.js';

/** The issues parseDraftList throws for `text` (fails the test if it does not throw). */
function issuesOf(text: string): HalfbreadthError['issues'] {
  try {
    parseDraftList(text);
  } catch (e) {
    if (e instanceof HalfbreadthError) return e.issues;
    throw e;
  }
  throw new Error(`parseDraftList('${text}') did not throw`);
}

describe('draft values', () => {
  test('comma-separated values are read in the order given', () => {
    expect(parseDraftList('0.5,0.6,1.25')).toEqual([0.5, 0.6, 1.25]);
  });

  test('spaces around values are allowed', () => {
    expect(parseDraftList(' 0.5 , 0.75 ')).toEqual([0.5, 0.75]);
  });

  test('a single value is a list of one', () => {
    expect(parseDraftList('1.2')).toEqual([1.2]);
  });
});

describe('draft ranges', () => {
  test('0.2:0.1:1.2 gives the 11 drafts 0.2, 0.3, ... 1.2, each the decimal as typed', () => {
    // By hand: (1.2 - 0.2) / 0.1 + 1 = 11 drafts. Plain floating-point stepping would give
    // 0.30000000000000004 for 0.2 + 0.1; a person typing 0.3 means 0.3.
    const d = parseDraftList('0.2:0.1:1.2');
    expect(d).toHaveLength(11);
    expect(d[1]).toBe(0.3);
    expect(d).toEqual([0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1, 1.2]);
  });

  test('a range and values mix: 0.2:0.1:0.4,0.45', () => {
    expect(parseDraftList('0.2:0.1:0.4,0.45')).toEqual([0.2, 0.3, 0.4, 0.45]);
  });

  test('a range whose step does not reach the end stops below it', () => {
    // 0.5, 0.8, 1.1; the next, 1.4, would pass 1.2.
    expect(parseDraftList('0.5:0.3:1.2')).toEqual([0.5, 0.8, 1.1]);
  });

  test('a range from a value to itself is that one value', () => {
    expect(parseDraftList('0.7:0.1:0.7')).toEqual([0.7]);
  });

  test('any range of hundredths gives its count and its decimals', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 500 }), fc.integer({ min: 1, max: 50 }), fc.integer({ min: 1, max: 60 }), (a, b, n) => {
        const from = a / 100;
        const step = b / 100;
        const to = (a + (n - 1) * b) / 100;
        const d = parseDraftList(`${from}:${step}:${to}`);
        expect(d).toHaveLength(n);
        // The k-th draft is the decimal (a + k b) / 100, to the last digit.
        d.forEach((v, k) => expect(v).toBe((a + k * b) / 100));
      }),
    );
  });
});

describe('drafts lists that are wrong', () => {
  test('an empty list is an error', () => {
    const [i] = issuesOf('  ');
    expect(i?.code).toBe('HYD_DRAFT_LIST');
    expect(i?.message).toMatch(/empty/);
  });

  test.each([
    ['0.5,abc', 1, /not a number/],
    ['0.5,,0.7', 1, /not a number/],
    ['1:2', 0, /from:step:to/],
    ['1:0.1:2:3', 0, /from:step:to/],
    ['1::2', 0, /not a number/],
    ['0.2:0:1', 0, /step must be greater than zero/],
    ['0.2:-0.1:1', 0, /step must be greater than zero/],
    ['1.2:0.1:0.2', 0, /run upwards/],
    ['0.5,Infinity', 1, /not a number/],
  ])('%s is rejected at item %i', (text, k, why) => {
    const [i] = issuesOf(text);
    expect(i?.code).toBe('HYD_DRAFT_LIST');
    expect(i?.path).toEqual(['drafts', k]);
    expect(i?.message).toMatch(why);
    expect(i?.message).toContain(`item ${k + 1}`);
  });
});

describe('the drafts limit', () => {
  test(`a range of exactly ${LIMITS.maxDrafts} drafts is accepted`, () => {
    // 0, 1, ... maxDrafts - 1: maxDrafts values.
    expect(parseDraftList(`0:1:${LIMITS.maxDrafts - 1}`)).toHaveLength(LIMITS.maxDrafts);
  });

  test('one draft more is refused with the limit named', () => {
    const [i] = issuesOf(`0:1:${LIMITS.maxDrafts}`);
    expect(i?.code).toBe('HYD_DRAFT_LIST');
    expect(i?.message).toContain(String(LIMITS.maxDrafts));
  });

  test('the limit counts values and ranges together', () => {
    const [i] = issuesOf(`0:1:${LIMITS.maxDrafts - 1},5000`);
    expect(i?.code).toBe('HYD_DRAFT_LIST');
    expect(i?.path).toEqual(['drafts', 1]);
  });

  test('a huge range is refused with the limit named', () => {
    const [i] = issuesOf('0:1e-12:1');
    expect(i?.code).toBe('HYD_DRAFT_LIST');
    expect(i?.message).toContain(String(LIMITS.maxDrafts));
  });
});
