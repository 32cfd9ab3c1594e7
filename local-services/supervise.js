#!/usr/bin/env node
// Keeps one local fake running: `node supervise.js NAME SCRIPT [ARGS…]` starts SCRIPT, and starts it
// again when it dies, with a growing pause, logging every exit and restart. SIGTERM or SIGINT stops
// the fake and then the supervisor, so whoever started the supervisor stops both with one signal.
'use strict';
const { spawn } = require('node:child_process');
const path = require('node:path');

const [name, script, ...args] = process.argv.slice(2);
if (!name || !script) {
  console.error('usage: node supervise.js NAME SCRIPT [ARGS…]');
  process.exit(2);
}

const FIRST_DELAY_MS = Number(process.env.SUPERVISE_FIRST_DELAY_MS || 1000);
const MAX_DELAY_MS = Number(process.env.SUPERVISE_MAX_DELAY_MS || 30_000);
/** A run this long counts as healthy: the next crash starts the back-off from the beginning. */
const HEALTHY_RUN_MS = 30_000;
/** The fake's own exit after SIGTERM gets this long before SIGKILL. */
const STOP_GRACE_MS = 8_000;
/** Makes the fake exit when this supervisor is gone, even by SIGKILL, so it is never orphaned. */
const EXIT_WITH_PARENT = path.join(__dirname, 'exit-with-parent.js');

let child;
let stopping = false;
let failuresInARow = 0;
let restartTimer;

const log = (message) => console.log(`${new Date().toISOString()} [supervise ${name}] ${message}`);

function run() {
  restartTimer = undefined;
  const startedAt = Date.now();
  child = spawn(process.execPath, ['--require', EXIT_WITH_PARENT, script, ...args], {
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
  });
  log(`started pid ${child.pid}`);
  child.once('exit', (code, signal) => {
    child = undefined;
    if (stopping) {
      log('stopped');
      process.exit(0);
    }
    failuresInARow = Date.now() - startedAt >= HEALTHY_RUN_MS ? 1 : failuresInARow + 1;
    const delay = Math.min(FIRST_DELAY_MS * 2 ** (failuresInARow - 1), MAX_DELAY_MS);
    log(`exited (${signal ? `signal ${signal}` : `code ${code}`}); restarting in ${delay} ms (failure ${failuresInARow} in a row)`);
    restartTimer = setTimeout(run, delay);
  });
}

function stop() {
  if (stopping) return;
  stopping = true;
  if (restartTimer) clearTimeout(restartTimer);
  if (!child) process.exit(0);
  child.kill('SIGTERM');
  setTimeout(() => child && child.kill('SIGKILL'), STOP_GRACE_MS).unref();
}

process.on('SIGTERM', stop);
process.on('SIGINT', stop);
run();
