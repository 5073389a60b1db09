#!/usr/bin/env node
/** Stops the preview server started by `npm start` / `npm run serve` (by the id in .preview-server.pid). */
'use strict';
const fs = require('fs');
const path = require('path');

const pidFile = path.join(__dirname, '..', '.preview-server.pid');
if (!fs.existsSync(pidFile)) {
  console.log('No preview server is running (no .preview-server.pid).');
  process.exit(0);
}
const pid = Number(fs.readFileSync(pidFile, 'utf8'));
try {
  process.kill(pid, 'SIGTERM');
  console.log(`Stopped the preview server (process ${pid}).`);
} catch {
  console.log(`Process ${pid} was not running; removing the stale pid file.`);
}
try {
  fs.unlinkSync(pidFile);
} catch {
  /* already gone */
}
