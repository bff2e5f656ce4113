/**
 * Formula-safe CSV everywhere (OWASP, "CSV Injection"): hostile names go through every
 * CSV the service writes (the offsets export, the table, the sheet, the Bonjean data,
 * the sectional areas) and every line is read back as a spreadsheet would, split on a
 * comma, a semicolon (locales with a decimal comma) and a tab, quotes removed and
 * leading spaces trimmed: no cell that is not a plain number may begin with = + - @, a
 * tab or a carriage return.
 */
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { readDecimal } from '../../core/common/decimal.js';
import { csvSafeText } from '../../core/common/csvSafe.js';
import { buildApp } from '../../server/app.js';
import { GOOD_OFFSETS } from '../fixtures/badRequests.js';
import { csvHeaders } from '../fixtures/serverHelpers.js';

/** Names a person could type (no control characters: those are refused), each hiding a formula from some reader. */
const HOSTILE = [
  'a,=1+2',
  ';"=1+2"',
  'x;=HYPERLINK("http://attacker.invalid")',
  '"=1"',
  'a"=1',
  'b| =1',
  'x,  -2+3',
  '@SUM(1+1)',
  '+1+1',
  '=1',
  'a ;  "@x"',
  'c,"+1",d',
  'caution: "x",=cmd|\' /C calc\'!A0',
  '\u00a0=1',
];

const DELIMITERS = [',', ';', '\t'] as const;

/**
 * A cell of plain numbers: one number, or a run of a numeric row that another delimiter
 * did not split (`-1.5,2` read with `;`). Numbers are written by the CSV writers from
 * our own figures, never from a person's text; a negative one is data, not a formula.
 */
const numbers = (c: string): boolean => c.split(/[,;\t]/).every((part) => part.trim() === '' || Number.isFinite(readDecimal(part)));

/** Cells that a spreadsheet splitting on `delimiter` would take as the start of a formula. */
function formulaCells(text: string): string[] {
  const out: string[] = [];
  for (const delimiter of DELIMITERS) {
    for (const line of text.split(/\r\n|\n/)) {
      if (line === '') continue;
      const cells = Papa.parse<string[]>(line, { delimiter, quoteChar: '"' }).data[0] ?? [];
      for (const cell of cells) {
        const c = cell.replace(/^[\s\u00a0]+/, '');
        if (/^[=+\-@\t\r]/.test(c) && !numbers(c)) out.push(`${JSON.stringify(delimiter)}: ${JSON.stringify(cell)} in ${JSON.stringify(line)}`);
      }
    }
  }
  return out;
}

describe('the checker itself', () => {
  test('finds the formulas the probes found: a name after a comma, after ;" and after a tab', () => {
    expect(formulaCells('# name: a,=1+2\n')).not.toEqual([]);
    expect(formulaCells('# hull: x;"=1+2"\n')).not.toEqual([]);
    expect(formulaCells('# hull: x\t"=1+2"\n')).not.toEqual([]);
    expect(formulaCells('x_m,area_m2\n-1.5,2\n')).toEqual([]);
  });
});

describe('csvSafeText', () => {
  test.each(HOSTILE.map((n) => [n]))('leaves no formula in %s, under any delimiter', (name) => {
    expect(formulaCells(csvSafeText(name))).toEqual([]);
    expect(formulaCells(`# hull: ${csvSafeText(name)}`)).toEqual([]);
  });

  test('turns control characters into spaces and changes a safe text not at all', () => {
    expect(csvSafeText('a\tb\r\nc\u2028d')).toBe('a b  c d');
    expect(csvSafeText('survey launch 7.2 m (rev B)')).toBe('survey launch 7.2 m (rev B)');
  });
});

describe('every CSV route', () => {
  test('writes hostile names so that no cell reads as a formula, split on , ; or tab', async () => {
    const app = await buildApp();
    try {
      const found: string[] = [];
      for (const name of HOSTILE) {
        const created = await app.inject({ method: 'POST', url: `/v1/hulls?name=${encodeURIComponent(name)}`, headers: csvHeaders, payload: GOOD_OFFSETS });
        expect(created.statusCode, name).toBe(201);
        const { id } = JSON.parse(created.body) as { id: string };
        const urls = [
          `/v1/hulls/${id}?format=csv`,
          `/v1/hulls/${id}?format=csv&units=mm`,
          `/v1/hulls/${id}/hydrostatics?drafts=0.5&format=csv`,
          `/v1/hulls/${id}/sheet?draft=0.5&format=csv`,
          `/v1/hulls/${id}/bonjean?format=csv`,
          `/v1/hulls/${id}/areas?draft=0.5&format=csv`,
        ];
        for (const url of urls) {
          const res = await app.inject({ method: 'GET', url });
          expect(res.statusCode, url).toBe(200);
          found.push(...formulaCells(res.body).map((f) => `${url}: ${f}`));
        }
        // The stateless routes write the name of the file the same way.
        const posted = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5&format=csv', headers: csvHeaders, payload: `# name: ${name}\n${GOOD_OFFSETS.replace(/^# name:.*\n/m, '')}` });
        expect(posted.statusCode, name).toBe(200);
        found.push(...formulaCells(posted.body));
      }
      expect(found).toEqual([]);
    } finally {
      await app.close();
    }
  });
});
