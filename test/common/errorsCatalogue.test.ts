/**
 * The error catalogue and its documentation are kept in step: every code of
 * ERROR_CODES is listed in docs/errors.md with an HTTP status, and every code listed
 * there exists.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { ERROR_CODES } from '../../core/common/errors.js';

const doc = readFileSync(new URL('../../docs/errors.md', import.meta.url), 'utf8');

/** Rows of the catalogue table: code and HTTP status, as written. */
function catalogueRows(markdown: string): { code: string; status: string }[] {
  const rows: { code: string; status: string }[] = [];
  for (const line of markdown.split('\n')) {
    const m = /^\|\s*`(HYD_[A-Z_]+)`\s*\|(.*)\|\s*$/.exec(line);
    if (m === null) continue;
    const cells = m[2]!.split('|').map((c) => c.trim());
    rows.push({ code: m[1]!, status: cells[cells.length - 1]! });
  }
  return rows;
}

describe('docs/errors.md', () => {
  const rows = catalogueRows(doc);
  const listed = rows.map((r) => r.code);

  test('the table reader finds the rows of a table and nothing else', () => {
    const sample = ['text `HYD_X` in prose', '| code | meaning | where | HTTP status |', '| `HYD_A` | a | here | 400 |', '| `HYD_B_C` | b | there | 422 |'].join('\n');
    expect(catalogueRows(sample)).toEqual([
      { code: 'HYD_A', status: '400' },
      { code: 'HYD_B_C', status: '422' },
    ]);
  });

  test('every code of the catalogue is listed', () => {
    const missing = Object.keys(ERROR_CODES).filter((c) => !listed.includes(c));
    expect(missing).toEqual([]);
  });

  test('every code listed exists in the catalogue', () => {
    const unknown = listed.filter((c) => !Object.hasOwn(ERROR_CODES, c));
    expect(unknown).toEqual([]);
  });

  test('each code is listed once', () => {
    expect(listed.filter((c, k) => listed.indexOf(c) !== k)).toEqual([]);
  });

  test('each code has one of the documented HTTP statuses', () => {
    const bad = rows.filter((r) => !['400', '404', '413', '415', '422'].includes(r.status));
    expect(bad).toEqual([]);
  });
});
