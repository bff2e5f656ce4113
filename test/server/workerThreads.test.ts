/**
 * Heavy work off the request thread (the response-time bound while it runs is in
 * freeLoop.test.ts): a small table stays on the request thread (no thread is even
 * started); the answers are the same wherever the work ran; and a computation past its
 * time limit is stopped with a problem document.
 */
import { readFileSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { buildApp } from '../../server/app.js';
import { boxCsv, csvHeaders, expectProblem } from '../fixtures/serverHelpers.js';
import { largeGrid } from '../fixtures/largeGrid.js';

const workboat = readFileSync(new URL('../../offsets-demo/workboat.csv', import.meta.url), 'utf8');

describe('where the work runs', () => {
  test('a 20-draft table stays on the request thread: no worker thread is started', async () => {
    const app = await buildApp();
    try {
      const res = await app.inject({ method: 'POST', url: '/v1/hydrostatics?drafts=0.5:0.05:1.45', headers: csvHeaders, payload: workboat });
      expect(res.statusCode).toBe(200);
      expect(app.halfbreadth.pool.threads).toBe(0);
    } finally {
      await app.close();
    }
  });
});

describe('the same answers wherever the work ran', () => {
  // One app that does everything on the request thread and one that sends every body and
  // every computation to its worker threads, for the two tests below: one pool of threads
  // (each thread loads the job code, a few hundred ms of CPU) instead of one per test.
  let inline: FastifyInstance;
  let workers: FastifyInstance;
  beforeAll(async () => {
    inline = await buildApp();
    workers = await buildApp({ limits: { inlineBytes: 0, inlineWork: 0 } });
  });
  afterAll(async () => {
    await inline?.close();
    await workers?.close();
  });

  test('answers and problems are the same whether the work ran on the request thread or in a worker', async () => {
    const requests = [
      { method: 'POST', url: '/v1/hydrostatics?drafts=0.5:0.1:1.5', headers: csvHeaders, payload: workboat },
      { method: 'POST', url: '/v1/sheet?draft=1.2&format=csv', headers: csvHeaders, payload: workboat },
      { method: 'POST', url: '/v1/check', headers: csvHeaders, payload: workboat.replace(/\n([^#\n][^,\n]*),/, '\n$1,-1,') },
      { method: 'POST', url: '/v1/hydrostatics?drafts=9', headers: csvHeaders, payload: workboat },
      { method: 'POST', url: '/v1/bonjean', headers: { 'content-type': 'application/json' }, payload: JSON.stringify({ offsets: { stations: [] }, drafts: [1] }) },
      // The stability work, its figures and its problems: a load the hull cannot float, and
      // heeled work on a table that stops at its top waterline (the notes on how it is written cross the thread).
      { method: 'POST', url: '/v1/cross-curves?displacements=20,30&heels=0,20,40&trim=free', headers: csvHeaders, payload: workboat },
      { method: 'POST', url: '/v1/float?displacement=30&lcg=6.5&kg=1.5&tcg=0.1', headers: csvHeaders, payload: workboat },
      { method: 'POST', url: '/v1/float?displacement=1e4&lcg=7', headers: csvHeaders, payload: workboat },
      { method: 'POST', url: '/v1/cross-curves?displacements=10', headers: csvHeaders, payload: boxCsv('no deck edge', 10, 4, 2) },
    ] as const;
    for (const r of requests) {
      const a = await inline.inject(r);
      const b = await workers.inject(r);
      expect(b.statusCode, r.url).toBe(a.statusCode);
      expect(b.headers['content-type']).toBe(a.headers['content-type']);
      expect(b.body.replace(/"requestId":"[^"]*"/, '')).toBe(a.body.replace(/"requestId":"[^"]*"/, ''));
    }
    expect(workers.halfbreadth.pool.threads).toBeGreaterThan(0);
  });

  test('storing, reading and computing on a stored hull give the same answers when a worker reads and writes it', async () => {
    const strip = (body: string): unknown => {
      const { id: _id, created: _c, updated: _u, links: _l, ...rest } = JSON.parse(body) as Record<string, unknown>;
      return rest;
    };
    const ids: string[] = [];
    for (const app of [inline, workers]) {
      const res = await app.inject({ method: 'POST', url: '/v1/hulls?name=threads', headers: csvHeaders, payload: workboat });
      expect(res.statusCode).toBe(201);
      ids.push((JSON.parse(res.body) as { id: string }).id);
    }
    const [a, b] = ids as [string, string];
    const get = (app: typeof inline, id: string, rest: string) => app.inject({ method: 'GET', url: `/v1/hulls/${id}${rest}` });
    expect(strip((await get(workers, b, '')).body)).toEqual(strip((await get(inline, a, '')).body));
    for (const rest of ['?format=csv', '?format=csv&units=ft-in-8', '/hydrostatics?drafts=0.5:0.1:1.5', '/sheet?draft=1&format=csv', '/check', '/float?displacement=30&lcg=6.5']) {
      const x = await get(inline, a, rest);
      const y = await get(workers, b, rest);
      expect(y.statusCode, rest).toBe(200);
      expect(y.body, rest).toBe(x.body);
    }
    // The stored table's notes on how it is written reach the worker: heeled work on a table without its deck edges is refused there too.
    const decks: string[] = [];
    for (const app of [inline, workers]) decks.push((JSON.parse((await app.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: boxCsv('no deck edge', 10, 4, 2) })).body) as { id: string }).id);
    const refused = [await get(inline, decks[0]!, '/cross-curves?displacements=10'), await get(workers, decks[1]!, '/cross-curves?displacements=10')];
    for (const r of refused) expect(expectProblem(r, 422).errors[0]!.code).toBe('HYD_DECK_NOT_GIVEN');
    const put = await workers.inject({ method: 'PUT', url: `/v1/hulls/${b}`, headers: { ...csvHeaders, 'if-match': (await get(workers, b, '')).headers.etag as string }, payload: workboat });
    expect(put.statusCode).toBe(200);
    const bad = await workers.inject({ method: 'POST', url: '/v1/hulls', headers: csvHeaders, payload: 'x,0,1\n0,1e308,1\n1,1,1\n2,1,1\n' });
    expect(expectProblem(bad, 422).errors[0]!.code).toBe('HYD_VALUE_RANGE');
  });
});

describe('limits of the work', () => {
  test('the probe that froze the service for 47 s (5,000 rows of half-breadths 1e100 to 1e308 sent to check) is answered at once', async () => {
    const app = await buildApp();
    try {
      const rows = Array.from({ length: 5000 }, (_, i) => `${i},1e${100 + ((i * 37) % 209)}`);
      const t0 = performance.now();
      const res = await app.inject({ method: 'POST', url: '/v1/check', headers: csvHeaders, payload: ['x,0,1', ...rows].join('\n') });
      // A bound on the defect (47 s of the event loop before), with a wide margin.
      expect(performance.now() - t0).toBeLessThan(3000);
      expect(res.statusCode).toBe(200);
      const body = JSON.parse(res.body) as { valid: boolean; issues: { code: string }[] };
      expect(body.valid).toBe(false);
      expect(body.issues[0]!.code).toBe('HYD_VALUE_RANGE');
    } finally {
      await app.close();
    }
  });

  test('a computation past its time limit is stopped: 503 with a problem document naming the limit', async () => {
    // The check of 1,000 x 300 offsets takes longer than 0.6 s on any machine (about 1.3 s
    // on an idle one). The limit may fall while the thread still loads the job's code
    // (a few hundred ms): that is stopped cleanly too (server/jobs/workerEntry.cts).
    const app = await buildApp({ limits: { computeTimeout: 600, inlineWork: 0 } });
    try {
      const res = await app.inject({ method: 'POST', url: '/v1/check', headers: csvHeaders, payload: largeGrid(1000, 300) });
      const doc = expectProblem(res, 503);
      expect(doc.errors[0]!.code).toBe('HYD_COMPUTE_LIMIT');
      expect(doc.detail).toContain('computeTimeout');
      // The service goes on answering.
      const again = await app.inject({ method: 'GET', url: '/healthz' });
      expect(again.statusCode).toBe(200);
    } finally {
      await app.close();
    }
  });

  test('an answer over the size limit is refused before anything is computed, naming the limit', async () => {
    const app = await buildApp({ limits: { maxAnswerCells: 1000 } });
    try {
      const res = await app.inject({ method: 'POST', url: '/v1/bonjean?drafts=0.1:0.01:2', headers: csvHeaders, payload: workboat });
      const doc = expectProblem(res, 422);
      expect(doc.errors[0]!.code).toBe('HYD_ANSWER_TOO_LARGE');
      expect(doc.detail).toContain('maxAnswerCells');
    } finally {
      await app.close();
    }
  });
});
