#!/usr/bin/env node
/**
 * Serves dist/ over plain http on localhost (the preview workbook at /), prints the address,
 * and opens a browser only where one is plainly available. Never fails for want of one.
 *   node scripts/serve.js [--port N] [--no-open] [--no-pid-file]   (PORT env works too; 0 = any free port)
 * Writes its process id to .preview-server.pid (beside package.json, outside dist/, which
 * every build empties) so `npm run stop` can end it; the browser tests pass --no-pid-file so
 * they never take over the record of a server someone started by hand.
 */
'use strict';
const fs = require('fs');
const http = require('http');
const path = require('path');
const { spawn } = require('child_process');
const { PREVIEW_CSP } = require('../webpack.config.js');

const root = path.join(__dirname, '..', 'dist');
const pidFile = path.join(__dirname, '..', '.preview-server.pid');
const args = process.argv.slice(2);
const portArg = args.indexOf('--port');
const wanted = Number(portArg >= 0 ? args[portArg + 1] : (process.env.PORT ?? 3100));
const open = !args.includes('--no-open') && !process.env.CI;
const keepPid = !args.includes('--no-pid-file');

const TYPES = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8', '.png': 'image/png', '.map': 'application/json', '.md': 'text/plain; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8', '.svg': 'image/svg+xml',
};

if (!fs.existsSync(path.join(root, 'index.html'))) {
  console.error('dist/index.html is missing: run `npm run build` first (npm start does both).');
  process.exit(1);
}

const server = http.createServer((req, res) => {
  const url = new URL(req.url ?? '/', 'http://localhost');
  let rel = decodeURIComponent(url.pathname);
  if (rel.endsWith('/')) rel += 'index.html';
  const file = path.normalize(path.join(root, rel));
  if (!file.startsWith(root + path.sep)) {
    res.writeHead(403).end('Forbidden');
    return;
  }
  fs.readFile(file, (err, body) => {
    if (err) {
      res.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8' }).end('Not found');
      return;
    }
    const headers = {
      'Content-Type': TYPES[path.extname(file)] ?? 'application/octet-stream',
      'X-Content-Type-Options': 'nosniff',
      'Cache-Control': 'no-cache',
    };
    if (file.endsWith('index.html')) headers['Content-Security-Policy'] = `${PREVIEW_CSP}; frame-ancestors 'none'`; // frame-ancestors works only as a header
    res.writeHead(200, headers).end(body);
  });
});

function tryOpen(address) {
  if (!open) return;
  const candidates =
    process.platform === 'darwin' ? [['open', [address]]]
      : process.platform === 'win32' ? [['cmd', ['/c', 'start', '', address]]]
        : process.env.DISPLAY || process.env.WAYLAND_DISPLAY ? [['xdg-open', [address]]] : [];
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
    try { fs.unlinkSync(pidFile); } catch { /* already gone */ }
  }
  server.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 500).unref();
};
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
server.listen(wanted, '127.0.0.1');
