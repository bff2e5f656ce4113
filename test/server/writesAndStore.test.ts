/**
 * Writes to stored hulls and where they are kept: PUT and DELETE honour If-Match
 * (RFC 9110, 13.1.1: strong comparison, 412 on a stale tag), so two editors cannot
 * silently overwrite each other; the store's files are readable by their owner only;
 * and a service bound beyond loopback says it has no authentication.
 */
import { mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { buildApp } from '../../server/app.js';
import { bindWarning, isLoopback } from '../../server/bindWarning.js';
import { GOOD_OFFSETS } from '../fixtures/badRequests.js';
import { boxCsv, csvHeaders, expectProblem } from '../fixtures/serverHelpers.js';

const dirs: string[] = [];
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

describe('conditional writes', () => {
  test('the safe update: GET the ETag, PUT with If-Match; a second PUT with the old tag gets 412 and writes nothing', async () => {
    const app = await buildApp();
    try {
      const created = await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: GOOD_OFFSETS });
      const { id } = JSON.parse(created.body) as { id: string };
      const tag = (await app.inject({ method: 'GET', url: `/v1/hulls/${id}` })).headers.etag as string;
      expect(created.headers.etag).toBe(tag);
      const first = await app.inject({ method: 'PUT', url: `/v1/hulls/${id}`, headers: { ...csvHeaders, 'if-match': tag }, payload: boxCsv('first editor', 10, 4, 2) });
      expect(first.statusCode).toBe(200);
      const second = await app.inject({ method: 'PUT', url: `/v1/hulls/${id}`, headers: { ...csvHeaders, 'if-match': tag }, payload: boxCsv('second editor', 12, 4, 2) });
      expect(expectProblem(second, 412).errors[0]!.code).toBe('HYD_PRECONDITION_FAILED');
      expect(JSON.parse((await app.inject({ method: 'GET', url: `/v1/hulls/${id}` })).body).name).toBe('first editor');
      // The tag the first PUT gave back lets its editor go on, and delete with it.
      const del = await app.inject({ method: 'DELETE', url: `/v1/hulls/${id}`, headers: { 'if-match': first.headers.etag as string } });
      expect(del.statusCode).toBe(204);
    } finally {
      await app.close();
    }
  });

  test('any tag a GET of the hull gives matches (the CSV form, another unit, the upload), and so does *', async () => {
    const app = await buildApp();
    try {
      const { id } = JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: GOOD_OFFSETS })).body) as { id: string };
      for (const url of [`/v1/hulls/${id}?format=csv&units=mm`, `/v1/hulls/${id}/source`]) {
        const tag = (await app.inject({ method: 'GET', url })).headers.etag as string;
        const put = await app.inject({ method: 'PUT', url: `/v1/hulls/${id}`, headers: { ...csvHeaders, 'if-match': `"other", ${tag}` }, payload: GOOD_OFFSETS });
        expect(put.statusCode, url).toBe(200);
      }
      expect((await app.inject({ method: 'DELETE', url: `/v1/hulls/${id}`, headers: { 'if-match': '*' } })).statusCode).toBe(204);
    } finally {
      await app.close();
    }
  });
});

describe('the store on disk', () => {
  test('its folder and files are created readable by their owner only', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'halfbreadth-modes-'));
    dirs.push(dir);
    const data = join(dir, 'data');
    const app = await buildApp({ dataDir: data });
    try {
      await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: GOOD_OFFSETS });
      expect(statSync(data).mode & 0o077).toBe(0);
      const files = readdirSync(data);
      expect(files).toContain('hulls.sqlite3');
      for (const f of files) expect(statSync(join(data, f)).mode & 0o077, f).toBe(0);
    } finally {
      await app.close();
    }
  });
});

describe('listening beyond loopback', () => {
  test('loopback addresses get no warning; any other address gets one that says there is no authentication', () => {
    for (const host of ['127.0.0.1', '127.1.2.3', '::1', '[::1]', 'localhost']) expect(isLoopback(host), host).toBe(true);
    for (const host of ['0.0.0.0', '::', '192.0.2.10', 'example.invalid']) {
      expect(bindWarning(host), host).toMatch(/no authentication.*reverse proxy with authentication/);
    }
    expect(bindWarning('127.0.0.1')).toBeUndefined();
  });
});
