/**
 * Adversarial: the preview server (scripts/serve.js) answers every request — malformed
 * paths, traversal, other methods, a foreign Host header (DNS rebinding), oversized
 * requests — with a status, the security headers, and without ending. It is started on a
 * free loopback port over a small folder of its own, and spoken to with raw sockets.
 */
import { ChildProcess, spawn } from 'child_process';
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'fs';
import { connect } from 'net';
import { tmpdir } from 'os';
import { join } from 'path';

const SERVE = join(__dirname, '..', '..', 'scripts', 'serve.js');
/** Every raw request must be answered well within this (they are answered in milliseconds). */
const ANSWER_TIMEOUT_MS = 5000;

interface Reply {
  readonly status: number;
  readonly headers: Record<string, string>;
  readonly body: string;
}

let server: ChildProcess;
let port = 0;
let exited: number | null | undefined;

function raw(request: string): Promise<Reply> {
  return new Promise((resolve, reject) => {
    const socket = connect({ host: '127.0.0.1', port });
    let data = '';
    const timer = setTimeout(() => {
      socket.destroy();
      reject(new Error(`no answer to ${JSON.stringify(request.slice(0, 80))}`));
    }, ANSWER_TIMEOUT_MS);
    socket.on('data', (chunk) => (data += chunk.toString('latin1')));
    socket.on('error', () => undefined); // the server may close while we still write
    socket.on('close', () => {
      clearTimeout(timer);
      const [head, ...rest] = data.split('\r\n\r\n');
      const [statusLine, ...lines] = head.split('\r\n');
      const headers: Record<string, string> = {};
      for (const line of lines) {
        const i = line.indexOf(':');
        headers[line.slice(0, i).toLowerCase()] = line.slice(i + 1).trim();
      }
      resolve({ status: Number(statusLine.split(' ')[1]), headers, body: rest.join('\r\n\r\n') });
    });
    socket.write(request);
  });
}

function get(path: string, host = `localhost:${port}`, method = 'GET'): Promise<Reply> {
  return raw(`${method} ${path} HTTP/1.1\r\nHost: ${host}\r\nConnection: close\r\n\r\n`);
}

function expectSecurityHeaders(reply: Reply): void {
  expect(reply.headers['x-content-type-options']).toBe('nosniff');
  expect(reply.headers['x-frame-options']).toBe('DENY');
  expect(reply.headers['content-security-policy']).toMatch(/frame-ancestors 'none'/);
}

beforeAll(async () => {
  const root = mkdtempSync(join(tmpdir(), 'proton-serve-'));
  const site = join(root, 'site');
  mkdirSync(join(site, 'help'), { recursive: true });
  writeFileSync(join(site, 'index.html'), '<!doctype html><title>preview</title>');
  writeFileSync(join(site, 'help', 'page.html'), '<!doctype html><title>help</title>');
  writeFileSync(join(site, 'app.js'), 'console.log(1);');
  writeFileSync(join(root, 'secret.txt'), 'outside the served folder');
  symlinkSync(join(root, 'secret.txt'), join(site, 'leak.txt'));
  server = spawn(process.execPath, [SERVE, '--port', '0', '--no-open', '--no-pid-file', '--root', site], { stdio: ['ignore', 'pipe', 'pipe'] });
  server.on('exit', (code) => (exited = code));
  port = await new Promise<number>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('server did not start')), 10000);
    server.stdout!.on('data', (chunk: Buffer) => {
      const m = /http:\/\/localhost:(\d+)\//.exec(chunk.toString());
      if (m) {
        clearTimeout(timer);
        resolve(Number(m[1]));
      }
    });
  });
}, 15000);

afterAll(() => {
  server.kill();
});

describe('preview server: every request answered, never a crash', () => {
  it('serves a page with its policy and the security headers; HEAD gives the headers alone', async () => {
    const page = await get('/');
    expect(page.status).toBe(200);
    expect(page.body).toMatch(/preview/);
    expect(page.headers['content-security-policy']).toMatch(/^default-src 'self'.*frame-ancestors 'none'$/);
    expectSecurityHeaders(page);
    const nested = await get('/help/page.html');
    expect(nested.headers['content-security-policy']).toMatch(/script-src 'self'/);
    const head = await get('/', `localhost:${port}`, 'HEAD');
    expect(head.status).toBe(200);
    expect(head.body).toBe('');
    expect(Number(head.headers['content-length'])).toBe(page.body.length);
    const script = await get('/app.js?v=1');
    expect(script.status).toBe(200);
    expect(script.headers['content-type']).toMatch(/javascript/);
    expectSecurityHeaders(script);
  });

  it.each([
    ['/%ff', 400],
    ['/%', 400],
    ['/%00', 400],
    ['/index.html%00.js', 400],
    ['/%E0%A4%A', 400],
    ['/..%5c..%5csecret.txt', 400],
    ['/../secret.txt', 404],
    ['/%2e%2e/secret.txt', 404],
    ['/%2e%2e%2fsecret.txt', 404],
    ['/help/../../secret.txt', 404],
    ['/leak.txt', 404],
    ['/help', 404],
    ['/missing.js', 404],
    ['*', 400],
    ['http://localhost/', 400],
    [`/${'a'.repeat(5000)}`, 414],
    [`/${'%'.repeat(3000)}`, 414],
  ])('GET %.40s → %d with the security headers', async (path, status) => {
    const reply = await get(path);
    expect(reply.status).toBe(status);
    expectSecurityHeaders(reply);
    expect(reply.body).not.toMatch(/outside the served folder/);
  });

  it.each(['POST', 'PUT', 'DELETE', 'OPTIONS', 'PATCH', 'TRACE', 'PROPFIND'])('%s → 405 with Allow: GET, HEAD', async (method) => {
    const reply = await get('/', `localhost:${port}`, method);
    expect(reply.status).toBe(405);
    expect(reply.headers.allow).toBe('GET, HEAD');
    expectSecurityHeaders(reply);
  });

  it('answers only to the loopback names with our port (DNS rebinding), and to each of them', async () => {
    for (const host of [
      'evil.example',
      `evil.example:${port}`,
      `localhost.evil.example:${port}`,
      `localhost:${port + 1}`,
      'localhost',
      `127.0.0.2:${port}`,
      `[::2]:${port}`,
      `0.0.0.0:${port}`,
      '',
    ]) {
      const reply = await get('/', host);
      expect([host, reply.status]).toEqual([host, 421]);
      expectSecurityHeaders(reply);
    }
    expect((await raw('GET / HTTP/1.0\r\n\r\n')).status).toBe(421); // no Host at all
    for (const host of [`localhost:${port}`, `LOCALHOST:${port}`, `127.0.0.1:${port}`, `[::1]:${port}`]) expect((await get('/', host)).status).toBe(200);
  });

  it('answers requests Node cannot parse (garbage, oversized headers) with 400 or 431 and the headers', async () => {
    const garbage = await raw('\u0000\u0001 nonsense\r\n\r\n');
    expect(garbage.status).toBe(400);
    expectSecurityHeaders(garbage);
    const huge = await raw(`GET / HTTP/1.1\r\nHost: localhost:${port}\r\nX-Pad: ${'x'.repeat(40000)}\r\n\r\n`);
    expect(huge.status).toBe(431);
    expectSecurityHeaders(huge);
    const hugeUrl = await raw(`GET /${'a'.repeat(100000)} HTTP/1.1\r\nHost: localhost:${port}\r\n\r\n`);
    expect([414, 431]).toContain(hugeUrl.status);
  });

  it('is still up and serving after all of it', async () => {
    expect((await get('/')).status).toBe(200);
    expect(exited).toBeUndefined();
  });
});
