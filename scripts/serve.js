#!/usr/bin/env node
/**
 * Serves dist/ over plain http on localhost (the preview workbook at /), prints the address,
 * and opens a browser only where one is plainly available. Never fails for want of one.
 *   node scripts/serve.js [--port N] [--no-open] [--no-pid-file] [--root DIR]   (PORT env works too; 0 = any free port)
 * Writes its process id to .preview-server.pid (beside package.json, outside dist/, which
 * every build empties) so `npm run stop` can end it; the browser tests pass --no-pid-file so
 * they never take over the record of a server someone started by hand. --root serves another
 * folder (the server's own tests use a small one).
 *
 * Any page the user has open can send requests to localhost, so every request is answered
 * and none can end the process: only GET and HEAD (405 with Allow otherwise); a path that
 * does not decode, holds a NUL or a backslash, or is longer than MAX_URL_LENGTH is a 400;
 * a path outside the folder (after decoding, normalising and following links) is a 404;
 * a Host header other than localhost, 127.0.0.1 or [::1] with our port is a 421 (a page on
 * another origin reaching us through a name it controls: DNS rebinding). Every response,
 * errors included, carries the security headers (SECURITY_HEADERS; the preview's
 * Content-Security-Policy on every HTML page).
 */
'use strict';
const fs = require('fs');
const http = require('http');
const path = require('path');
const { spawn } = require('child_process');
const { PREVIEW_CSP } = require('../webpack.config.js');

const args = process.argv.slice(2);
const rootArg = args.indexOf('--root');
const root = path.resolve(rootArg >= 0 ? args[rootArg + 1] : path.join(__dirname, '..', 'dist'));
const pidFile = path.join(__dirname, '..', '.preview-server.pid');
const portArg = args.indexOf('--port');
const wanted = Number(portArg >= 0 ? args[portArg + 1] : (process.env.PORT ?? 3100));
const open = !args.includes('--no-open') && !process.env.CI;
const keepPid = !args.includes('--no-pid-file');

const TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.png': 'image/png',
  '.map': 'application/json',
  '.md': 'text/plain; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
  '.svg': 'image/svg+xml',
};

if (!fs.existsSync(path.join(root, 'index.html'))) {
  console.error(`${path.join(root, 'index.html')} is missing: run \`npm run build\` first (npm start does both).`);
  process.exit(1);
}
const realRoot = fs.realpathSync(root);

/** Longest request path answered; a longer one is a 414 (browsers send up to a few KB). */
const MAX_URL_LENGTH = 2048;
/** Headers on every response, errors included: no type sniffing, no framing, no referrer, same origin only. */
const SECURITY_HEADERS = {
  'X-Content-Type-Options': 'nosniff',
  'X-Frame-Options': 'DENY',
  'Referrer-Policy': 'no-referrer',
  'Cross-Origin-Resource-Policy': 'same-origin',
  'Cache-Control': 'no-cache',
};
/** Policy of an HTML page (frame-ancestors works only as a header, not in the page's meta tag). */
const HTML_CSP = `${PREVIEW_CSP}; frame-ancestors 'none'`;
/** Policy of everything else, error pages included: nothing may run or load, nothing may frame it. */
const OTHER_CSP = "default-src 'none'; frame-ancestors 'none'";
const ALLOWED_METHODS = 'GET, HEAD';
const STATUS_TEXT = {
  400: 'Bad request',
  404: 'Not found',
  405: 'Method not allowed',
  414: 'Request path too long',
  421: 'Wrong host: use http://localhost',
  431: 'Request headers too large',
  500: 'Server error',
};

/** Whether a Host header names this server by a loopback name: localhost, 127.0.0.1 or [::1], with our port. */
function loopbackHost(host, port) {
  if (typeof host !== 'string') return false;
  const m = /^(localhost|127\.0\.0\.1|\[::1\])(?::(\d{1,5}))?$/i.exec(host);
  if (!m) return false;
  return m[2] === undefined ? port === 80 : Number(m[2]) === port;
}

function plainResponse(status, extra = {}) {
  const body = `${STATUS_TEXT[status] ?? 'Error'}\n`;
  return {
    head: { ...SECURITY_HEADERS, 'Content-Security-Policy': OTHER_CSP, 'Content-Type': 'text/plain; charset=utf-8', 'Content-Length': Buffer.byteLength(body), ...extra },
    body,
  };
}

function answer(res, status, extra) {
  if (res.headersSent) {
    res.destroy();
    return;
  }
  const { head, body } = plainResponse(status, extra);
  res.writeHead(status, head).end(body);
}

/** The file a request path names inside the root, or a status to answer instead. */
function resolveRequest(rawUrl) {
  if (typeof rawUrl !== 'string' || !rawUrl.startsWith('/')) return { status: 400 };
  if (rawUrl.length > MAX_URL_LENGTH) return { status: 414 };
  const pathname = rawUrl.split(/[?#]/, 1)[0];
  let rel;
  try {
    rel = decodeURIComponent(pathname);
  } catch {
    return { status: 400 }; // "/%ff", "/%": not UTF-8 or not percent-encoding
  }
  if (/[\0\\]/.test(rel)) return { status: 400 };
  if (rel.endsWith('/')) rel += 'index.html';
  const file = path.resolve(root, `.${rel}`);
  if (!file.startsWith(root + path.sep)) return { status: 404 };
  return { file };
}

function handle(req, res) {
  const port = server.address()?.port;
  if (!loopbackHost(req.headers.host, port)) return answer(res, 421);
  if (req.method !== 'GET' && req.method !== 'HEAD') return answer(res, 405, { Allow: ALLOWED_METHODS });
  const { status, file } = resolveRequest(req.url);
  if (status) return answer(res, status);
  fs.realpath(file, (linkErr, real) => {
    if (linkErr || !real.startsWith(realRoot + path.sep)) return answer(res, 404); // missing, or a link leading out
    fs.readFile(real, (err, body) => {
      if (err) return answer(res, 404); // a directory, unreadable
      const html = path.extname(real) === '.html';
      res.writeHead(200, {
        ...SECURITY_HEADERS,
        'Content-Type': TYPES[path.extname(real)] ?? 'application/octet-stream',
        'Content-Length': body.length,
        'Content-Security-Policy': html ? HTML_CSP : OTHER_CSP,
      });
      res.end(req.method === 'HEAD' ? undefined : body);
    });
  });
}

const server = http.createServer({ maxHeaderSize: 16384, requestTimeout: 30000, headersTimeout: 20000 }, (req, res) => {
  res.on('error', () => res.destroy());
  try {
    handle(req, res);
  } catch {
    answer(res, 500); // a bug here must not end the server; every known case is answered above
  }
});
// A request Node cannot parse (a bad request line, headers too large): answer it with the same headers, then close.
server.on('clientError', (err, socket) => {
  if (!socket.writable || err.code === 'ECONNRESET') {
    socket.destroy();
    return;
  }
  const status = err.code === 'HPE_HEADER_OVERFLOW' ? 431 : 400;
  const { head, body } = plainResponse(status, { Connection: 'close' });
  const lines = Object.entries(head)
    .map(([k, v]) => `${k}: ${v}`)
    .join('\r\n');
  socket.end(`HTTP/1.1 ${status} ${STATUS_TEXT[status]}\r\n${lines}\r\n\r\n${body}`);
});

function tryOpen(address) {
  if (!open) return;
  const candidates =
    process.platform === 'darwin'
      ? [['open', [address]]]
      : process.platform === 'win32'
        ? [['cmd', ['/c', 'start', '', address]]]
        : process.env.DISPLAY || process.env.WAYLAND_DISPLAY
          ? [['xdg-open', [address]]]
          : [];
  for (const [cmd, cmdArgs] of candidates) {
    try {
      const child = spawn(cmd, cmdArgs, { stdio: 'ignore', detached: true });
      child.on('error', () => {});
      child.unref();
    } catch {
      // No browser here: the printed address is enough.
    }
  }
}

server.on('error', (err) => {
  if (err.code === 'EADDRINUSE' && wanted !== 0) {
    console.warn(`Port ${wanted} is taken; using a free one.`);
    server.listen(0, '127.0.0.1');
  } else {
    console.error(`Could not start the server: ${err.message}`);
    process.exit(1);
  }
});
server.on('listening', () => {
  const { port } = server.address();
  const address = `http://localhost:${port}/`;
  if (keepPid) fs.writeFileSync(pidFile, String(process.pid));
  console.log(`Proton Ledger preview workbook: ${address}`);
  console.log('Press Ctrl+C to stop (or `npm run stop` from another terminal).');
  tryOpen(address);
});
const shutdown = () => {
  if (keepPid) {
    try {
      fs.unlinkSync(pidFile);
    } catch {
      /* already gone */
    }
  }
  server.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 500).unref();
};
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
server.listen(wanted, '127.0.0.1');
