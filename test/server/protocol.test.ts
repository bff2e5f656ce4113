/**
 * The HTTP protocol's own failures, over a real socket: every answer, Node's own 400, 408
 * and 431 included, is a problem document (RFC 9457); the request and idle timeouts
 * hold to what README says (here set small, so the test is quick: the mechanism is the
 * same at 30 s); the longest drafts text the service takes fits in a URL it accepts.
 */
import { connect, type Socket } from 'node:net';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { CAUTION } from '../../core/common/caution.js';
import { buildApp } from '../../server/app.js';
import { SERVICE_LIMITS } from '../../server/serviceLimits.js';
import { expectProblem } from '../fixtures/serverHelpers.js';

let app: FastifyInstance;
let port: number;
const HEADERS_TIMEOUT = 400;
const REQUEST_TIMEOUT = 600;
const KEEP_ALIVE_TIMEOUT = 300;

beforeAll(async () => {
  app = await buildApp({
    limits: { headersTimeout: HEADERS_TIMEOUT, requestTimeout: REQUEST_TIMEOUT, keepAliveTimeout: KEEP_ALIVE_TIMEOUT, timeoutCheckInterval: 100 },
  });
  await app.listen({ port: 0, host: '127.0.0.1' });
  const addr = app.server.address();
  if (addr === null || typeof addr === 'string') throw new Error('no port');
  port = addr.port;
});
afterAll(async () => {
  await app.close();
});

/** Everything the server writes until it closes the socket, and when it closed it. */
function exchange(send: (s: Socket) => void): Promise<{ text: string; closedAfter: number }> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const s = connect(port, '127.0.0.1', () => send(s));
    let text = '';
    s.on('data', (c) => (text += c.toString()));
    s.on('error', reject);
    s.on('close', () => resolve({ text, closedAfter: performance.now() - t0 }));
  });
}

/** A raw HTTP answer as the shape expectProblem reads. */
function parse(raw: string): { statusCode: number; headers: Record<string, string>; body: string } {
  const [head, ...rest] = raw.split('\r\n\r\n');
  const [status, ...lines] = head!.split('\r\n');
  const headers = Object.fromEntries(lines.map((l) => [l.slice(0, l.indexOf(':')).toLowerCase(), l.slice(l.indexOf(':') + 1).trim()]));
  return { statusCode: Number(status!.split(' ')[1]), headers, body: rest.join('\r\n\r\n') };
}

describe("Node's own answers are problem documents", () => {
  test('a request that is not HTTP: 400', async () => {
    const { text } = await exchange((s) => s.write('HELLO THERE\r\n\r\n'));
    const doc = expectProblem(parse(text), 400);
    expect(doc.errors[0]!.code).toBe('HYD_BAD_REQUEST');
    expect(doc.caution).toBe(CAUTION);
  });

  test('headers over the limit: 431', async () => {
    const { text } = await exchange((s) => s.write(`GET /healthz HTTP/1.1\r\nHost: x\r\nX-Long: ${'a'.repeat(SERVICE_LIMITS.maxHeaderSize + 10)}\r\n\r\n`));
    const doc = expectProblem(parse(text), 431);
    expect(doc.errors[0]!.code).toBe('HYD_HEADERS_TOO_LARGE');
  });

  test.concurrent('a body that does not arrive in time: 408, and the socket is closed within the timeout and its check', async () => {
    const { text, closedAfter } = await exchange((s) => s.write('POST /v1/check HTTP/1.1\r\nHost: x\r\nContent-Type: text/csv\r\nContent-Length: 100\r\n\r\nx,0,1\n'));
    const doc = expectProblem(parse(text), 408);
    expect(doc.errors[0]!.code).toBe('HYD_REQUEST_TIMEOUT');
    // Cut at the request timeout plus at most one check interval (100 ms here), not a whole default interval of 30 s later.
    expect(closedAfter).toBeGreaterThan(REQUEST_TIMEOUT - 50);
    expect(closedAfter).toBeLessThan(REQUEST_TIMEOUT + 1000);
  });

  test.concurrent('a connection that sends nothing gets 408 at the headers timeout', async () => {
    const { text, closedAfter } = await exchange(() => undefined);
    expect(expectProblem(parse(text), 408).errors[0]!.code).toBe('HYD_REQUEST_TIMEOUT');
    expect(closedAfter).toBeGreaterThan(HEADERS_TIMEOUT - 50);
    expect(closedAfter).toBeLessThan(HEADERS_TIMEOUT + 1000);
  });

  test.concurrent('a kept-alive socket with no next request is closed after the keep-alive timeout', async () => {
    let answered = 0;
    const { text, closedAfter } = await exchange((s) => {
      s.write('GET /healthz HTTP/1.1\r\nHost: x\r\n\r\n');
      s.once('data', () => (answered = performance.now()));
    });
    expect(text.startsWith('HTTP/1.1 200')).toBe(true);
    expect(answered).toBeGreaterThan(0);
    // Node closes a kept-alive socket a second after keepAliveTimeout (its buffer against
    // clients racing the close); 1.5 s more is margin for a busy machine.
    expect(closedAfter).toBeLessThan(KEEP_ALIVE_TIMEOUT + 1000 + 1500);
  });
});

describe('the longest drafts list fits in a URL', () => {
  test(`${SERVICE_LIMITS.maxDraftsText} characters of drafts reach the drafts rule, not a 431`, async () => {
    // 2,000 drafts written out one by one, as long a list as the service takes, under the text limit.
    const drafts = Array.from({ length: 2000 }, (_, k) => (0.1 + k * 0.0004).toFixed(4)).join(',');
    expect(drafts.length).toBeLessThanOrEqual(SERVICE_LIMITS.maxDraftsText);
    const ok = await fetch(`http://127.0.0.1:${port}/v1/hulls/none/hydrostatics?drafts=${drafts}`);
    expect(ok.status).toBe(404); // no such hull: the URL was read whole
    const over = `${drafts},${'1,'.repeat((SERVICE_LIMITS.maxDraftsText - drafts.length) / 2 + 10)}1`;
    const res = await fetch(`http://127.0.0.1:${port}/v1/hydrostatics?drafts=${over}`, { method: 'POST', headers: { 'content-type': 'text/csv' }, body: 'x,0,1\n0,1,1\n1,1,1\n2,1,1\n' });
    const doc = expectProblem({ statusCode: res.status, headers: Object.fromEntries(res.headers), body: await res.text() }, 400);
    expect(doc.errors[0]!.message).toContain(`longer than ${SERVICE_LIMITS.maxDraftsText} characters`);
  });
});
